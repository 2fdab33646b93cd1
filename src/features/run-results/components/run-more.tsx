import { countText, percentText } from '../../../../shared/format/index';
import type { RunResult } from '../../../../shared/schemas/run-result';

const STOPPED: Record<NonNullable<RunResult['engine']['stopping']>['reason'], string> = {
  decided: 'the verdict was decided',
  precision: 'the interval reached its precision',
  'max-batches': 'it reached its largest batch count without a decision',
};

/** How far the run is from a decision, in particles and batches, and how a run to a precision stopped. */
export function RunMore({ view }: { view: RunResult }) {
  const { engine, limit } = view;
  const perBatch = engine.particles / engine.batches;
  const more = limit && !limit.decided ? limit.moreHistories : undefined;
  const stop = engine.stopping;
  return (
    <>
      {more !== undefined && (
        <p className="mt-2 text-sm font-semibold" data-testid="run-more">
          {more === null
            ? 'More particles may not settle this: check the reasons above before running again.'
            : `To decide, run about ${countText(more)} more particles: about ${countText(Math.ceil(more / perBatch))} more batches of ${countText(perBatch)}, or set the run to a precision.`}
        </p>
      )}
      {stop && (
        <p className="mt-2 text-sm text-muted" data-testid="stopping">
          Run until ±{percentText(100 * stop.relativeHalfWidth, 2)} or a decision: stopped at {countText(engine.batches)} batches because{' '}
          {STOPPED[stop.reason]}. It looked only at {stop.looks.map((l) => l.batches).join(', ')} batches and spent the 5 % error rate over
          those looks, so each interval shown is wider than a single run's and looking again could not make a Clear.
        </p>
      )}
    </>
  );
}
