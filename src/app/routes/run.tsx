import { countText } from '../../../shared/format/index';
import { Link, useParams } from 'react-router-dom';
import { Page } from '@/components/ui/page';
import { ErrorMessage, Spinner } from '@/components/ui/status';
import { paths } from '@/config/paths';
import { RunResults } from '@/features/run-results/components/run-results';
import { useRun } from '@/features/scenarios/api/get-run';
import { dateTime } from '@/lib/format';

// A saved run opens from the server as it was stored: nothing is re-run.
export function RunRoute() {
  const id = Number(useParams().id);
  const run = useRun(id);
  if (run.isPending) return <Spinner label="Loading the saved run…" />;
  if (run.error) return <ErrorMessage error={run.error} />;
  const r = run.data;
  return (
    <Page
      title={`Run of “${r.scenarioName}”`}
      intro={
        <>
          Saved {dateTime(r.createdAt)} · engine {r.engineVersion} · seed <code>{r.seed}</code> · {countText(r.particles)} particles ·{' '}
          <Link className="underline" to={paths.scenario(r.scenarioId)}>
            open the scenario
          </Link>{' '}
          ·{' '}
          <Link className="underline" to={`${paths.report(r.scenarioId)}?run=${r.id}`}>
            report
          </Link>
        </>
      }
    >
      {r.outOfDate && (
        <p role="status" className="mb-4 rounded-md border-2 border-watch bg-watch-soft p-3 text-sm font-semibold text-watch">
          ⟳ Out of date: the scenario has changed since this run. These results describe the inputs as they were then.
        </p>
      )}
      <RunResults result={r.result} scenario={r.input} limitSource={r.input.limit?.source} title={r.scenarioName} />
    </Page>
  );
}
