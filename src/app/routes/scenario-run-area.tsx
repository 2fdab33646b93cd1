import type { Scenario } from '../../../shared/schemas/scenario';
import type { ScenarioDetail } from '../../../shared/schemas/workspace-views';
import { Button } from '@/components/ui/button';
import { ErrorMessage, Notice } from '@/components/ui/status';
import type { RunResult } from '../../../shared/schemas/run-result';
import { auditKeys } from '@/features/audit/api/get-audit';
import { requestRunTicket } from '@/features/scenarios/api/request-run-ticket';
import { useSaveRun } from '@/features/scenarios/api/save-run';
import { RunPanel } from '@/features/scenarios/components/run-panel';

const AUDIT = [auditKeys.all] as const;

type Fresh = { result: RunResult; input: Scenario; ticket?: string } | null;

export function ScenarioRunArea({
  scenario,
  input,
  dirty,
  fresh,
  onFresh,
}: {
  scenario: ScenarioDetail;
  input: Scenario | null;
  dirty: boolean;
  fresh: Fresh;
  onFresh: (f: Fresh) => void;
}) {
  // "Run by" on the report comes from the audit trail.
  const save = useSaveRun(AUDIT);
  return (
    <section aria-labelledby="run-heading" className="mt-8 space-y-3">
      <h2 id="run-heading">Run</h2>
      <p className="text-sm text-muted">
        Runs in this browser's background workers with a seed the server hands out for this run; the server re-runs part of it before
        keeping it, and the same scenario and seed always give the same result.
      </p>
      <RunPanel
        scenario={input}
        requestTicket={() => requestRunTicket(scenario.id)}
        onResult={(result, used, ticket) => {
          save.reset();
          onFresh({ result, input: used, ticket });
        }}
      />
      {fresh && (
        <div className="flex flex-wrap items-center gap-3">
          <Button
            onClick={() =>
              fresh.ticket &&
              save.mutate({
                scenarioId: scenario.id,
                scenarioVersion: scenario.version,
                ticket: fresh.ticket,
                input: fresh.input,
                result: fresh.result,
              })
            }
            disabled={save.isPending || save.isSuccess || dirty || !fresh.ticket}
          >
            {save.isSuccess ? '✓ Run saved' : save.isPending ? 'Checking and saving…' : 'Save this run'}
          </Button>
          {dirty && <span className="text-sm text-watch">Save the scenario first, so the run matches what is stored.</span>}
          {save.isSuccess && <Notice>Saved. Anyone with read access can open it without running it again.</Notice>}
          {save.error && <ErrorMessage title="Run not saved" error={save.error} />}
        </div>
      )}
    </section>
  );
}
