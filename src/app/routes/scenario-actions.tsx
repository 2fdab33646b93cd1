import { useState } from 'react';
import { Link, useNavigate } from 'react-router-dom';
import { scenarioSchema } from '../../../shared/schemas/scenario';
import type { ScenarioDetail } from '../../../shared/schemas/workspace-views';
import { Can } from '@/components/can';
import { Button } from '@/components/ui/button';
import { ErrorMessage, Notice } from '@/components/ui/status';
import { paths } from '@/config/paths';
import { ApiError } from '@/lib/api-client';
import { useDeleteScenario } from '@/features/scenarios/api/delete-scenario';
import { useDuplicateScenario } from '@/features/scenarios/api/duplicate-scenario';
import { useUpdateScenario } from '@/features/scenarios/api/update-scenario';
import { ConflictPanel } from '@/features/scenarios/components/conflict-panel';
import type { Draft } from './scenario';

type Theirs = { version: number; name: string; input: unknown };
type Props = {
  scenario: ScenarioDetail;
  draft: Draft;
  dirty: boolean;
  valid: boolean;
  onSaved: (s: ScenarioDetail) => void;
  onReload: (s: ScenarioDetail) => void;
};

export function ScenarioActions({ scenario, draft, dirty, valid, onSaved, onReload }: Props) {
  const navigate = useNavigate();
  const update = useUpdateScenario();
  const duplicate = useDuplicateScenario();
  const remove = useDeleteScenario();
  const [conflict, setConflict] = useState<Theirs | null>(null);

  const save = (version: number) =>
    update.mutate(
      {
        id: scenario.id,
        patch: {
          version,
          name: draft.name,
          agentId: draft.agentId,
          sizeProfileId: draft.sizeProfileId,
          controlTier: draft.controlTier,
          controlDescription: draft.controlDescription,
          input: scenarioSchema.parse(draft.input),
        },
      },
      {
        onSuccess: (s) => {
          setConflict(null);
          onSaved(s);
        },
        onError: (e) => {
          if (e instanceof ApiError && e.status === 409) setConflict(e.body.current as Theirs);
        },
      },
    );

  return (
    // Below the title and its line of facts (they rarely leave room beside them), so the buttons start at the left.
    <div className="flex max-w-3xl flex-col items-start gap-2">
      <div className="flex flex-wrap gap-2">
        <Can permission="scenarios:write">
          <Button onClick={() => save(scenario.version)} disabled={!dirty || !valid || update.isPending}>
            {update.isPending ? 'Saving…' : dirty ? 'Save changes' : 'Saved'}
          </Button>
          <Button
            variant="secondary"
            onClick={() => duplicate.mutate({ id: scenario.id }, { onSuccess: (s) => navigate(paths.scenario(s.id)) })}
          >
            Duplicate as new option
          </Button>
          <Link
            className="rounded-md border border-line bg-white px-4 py-2 text-sm font-semibold hover:bg-paper-deep"
            to={paths.sweep(scenario.id)}
          >
            Placement sweep
          </Link>
        </Can>
        <Link
          className="rounded-md border border-line bg-white px-4 py-2 text-sm font-semibold hover:bg-paper-deep"
          to={`${paths.compare}?ids=${scenario.id}`}
        >
          Side by side
        </Link>
        <Link
          className="rounded-md border border-line bg-white px-4 py-2 text-sm font-semibold hover:bg-paper-deep"
          to={paths.report(scenario.id)}
        >
          Report
        </Link>
        <Can permission="scenarios:write">
          {scenario.status !== 'approved' && (
            <Button
              variant="danger"
              onClick={() =>
                window.confirm(`Delete “${scenario.name}”? Its saved runs stay in the records.`) &&
                remove.mutate(scenario.id, { onSuccess: () => navigate(paths.workstation(scenario.workstationId)) })
              }
            >
              Delete
            </Button>
          )}
        </Can>
      </div>
      {dirty && !valid && <p className="text-sm text-act">Some fields are not valid; fix them to save.</p>}
      {update.isSuccess && !dirty && <Notice>Saved as version {update.data.version}.</Notice>}
      {update.error && !conflict && <ErrorMessage title="Not saved" error={update.error} />}
      {(duplicate.error || remove.error) && <ErrorMessage error={duplicate.error ?? remove.error} />}
      {conflict && (
        <ConflictPanel
          mine={{ version: scenario.version, name: draft.name, input: draft.input }}
          theirs={conflict}
          onKeepMine={() => save(conflict.version)}
          onTakeTheirs={() => {
            setConflict(null);
            onReload({ ...scenario, version: conflict.version, name: conflict.name, input: conflict.input as ScenarioDetail['input'] });
          }}
        />
      )}
    </div>
  );
}
