import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { ErrorMessage, Notice } from '@/components/ui/status';
import { useAssignOperators } from '@/features/places/api/assign-operators';

type Operator = { id: number; name: string; email: string; status: string };

export function OperatorAssignment({
  workstationId,
  operators,
  assigned,
}: {
  workstationId: number;
  operators: Operator[];
  assigned: number[];
}) {
  const [chosen, setChosen] = useState<number[]>(assigned);
  const assign = useAssignOperators();
  const toggle = (id: number) => setChosen((c) => (c.includes(id) ? c.filter((x) => x !== id) : [...c, id]));
  return (
    <section aria-labelledby="operators-heading" className="mb-6 rounded-lg border border-line bg-white p-4">
      <h2 id="operators-heading">Operators who see this station's board</h2>
      {operators.length === 0 ? (
        <p className="mt-1 text-sm text-muted">No operators yet: invite someone with the operator role on the People page.</p>
      ) : (
        <fieldset className="mt-2 flex flex-wrap gap-4">
          <legend className="sr-only">Operators</legend>
          {operators.map((o) => (
            <label key={o.id} className="flex items-center gap-2 text-sm">
              <input type="checkbox" checked={chosen.includes(o.id)} onChange={() => toggle(o.id)} disabled={o.status === 'deactivated'} />
              {o.name} <span className="text-muted">{o.email}</span>
            </label>
          ))}
        </fieldset>
      )}
      <div className="mt-3 flex items-center gap-3">
        <Button
          variant="secondary"
          onClick={() => assign.mutate({ workstationId, personIds: chosen })}
          disabled={assign.isPending || operators.length === 0}
        >
          Save assignment
        </Button>
        {assign.isSuccess && <Notice>Saved.</Notice>}
      </div>
      {assign.error && <ErrorMessage title="Not saved" error={assign.error} />}
    </section>
  );
}
