import { SelectField, TextField } from '@/components/ui/field';

export type FilterOption = { id: number; name: string };
export type FilterValue = { siteId?: number; workstationId?: number; agentId?: number; status?: 'draft' | 'approved'; q?: string };

type Props = {
  sites: FilterOption[];
  workstations: FilterOption[];
  agents: FilterOption[];
  value: FilterValue;
  onChange: (v: FilterValue) => void;
};

const num = (v: string) => (v ? Number(v) : undefined);

export function ScenarioFilters({ sites, workstations, agents, value, onChange }: Props) {
  return (
    <div role="search" aria-label="Filter scenarios" className="mb-4 grid gap-3 sm:grid-cols-2 lg:grid-cols-5">
      <TextField label="Name contains" value={value.q ?? ''} onChange={(e) => onChange({ ...value, q: e.target.value || undefined })} />
      <SelectField label="Site" value={value.siteId ?? ''} onChange={(e) => onChange({ ...value, siteId: num(e.target.value) })}>
        <option value="">All sites</option>
        {sites.map((s) => (
          <option key={s.id} value={s.id}>
            {s.name}
          </option>
        ))}
      </SelectField>
      <SelectField
        label="Workstation"
        value={value.workstationId ?? ''}
        onChange={(e) => onChange({ ...value, workstationId: num(e.target.value) })}
      >
        <option value="">All workstations</option>
        {workstations.map((w) => (
          <option key={w.id} value={w.id}>
            {w.name}
          </option>
        ))}
      </SelectField>
      <SelectField label="Dust agent" value={value.agentId ?? ''} onChange={(e) => onChange({ ...value, agentId: num(e.target.value) })}>
        <option value="">All agents</option>
        {agents.map((a) => (
          <option key={a.id} value={a.id}>
            {a.name}
          </option>
        ))}
      </SelectField>
      <SelectField
        label="Status"
        value={value.status ?? ''}
        onChange={(e) => onChange({ ...value, status: (e.target.value || undefined) as FilterValue['status'] })}
      >
        <option value="">Any status</option>
        <option value="draft">Draft</option>
        <option value="approved">Approved</option>
      </SelectField>
    </div>
  );
}
