import { percentText, readableNumber } from '../../../../shared/format/index';
import { withJetSpeedScaled } from '../../../../shared/physics/release-jets';
import type { RunResult } from '../../../../shared/schemas/run-result';
import type { Scenario } from '../../../../shared/schemas/scenario';
import { BannerBadge } from '@/components/banner-badge';
import { ProgressBar, timeLeft } from '@/components/progress-bar';
import { Button } from '@/components/ui/button';
import { ErrorMessage } from '@/components/ui/status';
import { RUN_START, useEngineRun } from '@/hooks/use-engine-run';
import { runSimulation } from '@/lib/simulation-bridge';
import { Section } from './section';
import type { Banner } from '../../../../shared/vocabulary/fractions';

const FACTORS = [0.5, 2] as const;

interface Row {
  factor: number;
  speed_mPerS: number;
  banner: Banner | null;
  percent: number | null;
  percentUpper: number | null;
  captured: number;
}

function rowOf(factor: number, r: RunResult): Row {
  return {
    factor,
    speed_mPerS: r.model?.jet?.speed_mPerS ?? 0,
    banner: r.limit?.banner ?? null,
    percent: r.limit?.percentOfLimit ?? null,
    percentUpper: r.limit?.percentOfLimitUpper ?? null,
    captured: r.fate.captured,
  };
}

// A new result starts the section afresh: reruns of an earlier result must not sit under it.
const resultIds = new WeakMap<RunResult, number>();
let nextId = 0;
function idOf(view: RunResult): number {
  let id = resultIds.get(view);
  if (id === undefined) resultIds.set(view, (id = ++nextId));
  return id;
}

/**
 * The release jet's speed is a default from common practice unless the engineer measured it, so
 * the verdict should not hang on it unseen: the same scenario, seed and particle count at half and
 * twice the jet speed (common random numbers, so the difference is the jet's, not the noise's).
 */
export function JetSensitivity({ view, scenario }: { view: RunResult; scenario: Scenario }) {
  const jet = view.model?.jet;
  return jet ? <JetReruns key={idOf(view)} view={view} scenario={scenario} jet={jet} /> : null;
}

function JetReruns({ view, scenario, jet }: { view: RunResult; scenario: Scenario; jet: NonNullable<RunResult['model']>['jet'] & object }) {
  const run = useEngineRun<Row[]>(RUN_START);
  const state = run.state;
  const running = state.phase === 'running';

  async function start() {
    await run.start(async ({ signal, onProgress }) => {
      const rows: Row[] = [];
      for (const [i, factor] of FACTORS.entries()) {
        // The same particles as the run shown, without a precision rule: both arms then stop at the same batch.
        const settings = {
          ...scenario.run,
          precision: undefined,
          batches: view.engine.batches,
          particles: view.engine.particles,
          seed: view.engine.seed,
        };
        const input = { ...withJetSpeedScaled(scenario, factor), run: settings };
        const r = await runSimulation(input, {
          signal,
          onProgress: (p) => onProgress({ ...p, fraction: (i + p.fraction) / FACTORS.length }),
        });
        rows.push(rowOf(factor, r));
      }
      return rows;
    });
  }

  const shown = state.phase === 'done' ? withThisRun(view, state.result) : [];
  const banners = new Set(shown.map((r) => r.banner));
  const pct = running ? Math.round(state.progress.fraction * 100) : 0;
  // On paper the section only makes sense once the reruns have answered.
  return (
    <div className={shown.length > 0 ? undefined : 'print:hidden'}>
      <Section
        title="Jet speed sensitivity"
        intro={`The release jet was taken as ${readableNumber(jet.speed_mPerS, 3)} m/s${jet.fromDefault ? ', the release type’s default (common practice, not measured)' : ''}. Rerun at half and twice that speed to see whether the verdict depends on it.`}
      >
        <div className="flex flex-wrap items-center gap-3 print:hidden">
          <Button variant="secondary" onClick={start} disabled={running}>
            Rerun at ½× and 2× the jet speed
          </Button>
          {running && (
            <Button variant="secondary" onClick={run.cancel}>
              Cancel
            </Button>
          )}
          {state.phase === 'cancelled' && (
            <span role="status" className="text-sm text-muted">
              Sensitivity runs cancelled.
            </span>
          )}
        </div>
        {running && (
          <div className="mt-3 max-w-xl">
            <ProgressBar label="Jet sensitivity progress" percent={pct} />
            <p className="mt-1 text-sm text-muted" aria-live="polite">
              {pct} % · about {timeLeft(state.progress.secondsLeft)} left
            </p>
          </div>
        )}
        {state.phase === 'failed' && <ErrorMessage title="The sensitivity runs failed" error={state.error} />}
        {shown.length > 0 && (
          <>
            <table className="mt-3 w-full max-w-2xl text-sm" data-testid="jet-sensitivity">
              <caption className="sr-only">Result at half, the same and twice the jet speed</caption>
              <thead>
                <tr className="text-left text-muted">
                  <th scope="col" className="py-1 font-semibold">
                    Jet speed
                  </th>
                  <th scope="col" className="py-1 font-semibold">
                    Banner
                  </th>
                  <th scope="col" className="py-1 text-right font-semibold">
                    % of limit (upper bound)
                  </th>
                  <th scope="col" className="py-1 text-right font-semibold">
                    Captured
                  </th>
                </tr>
              </thead>
              <tbody>
                {shown.map((r) => (
                  <tr key={r.factor} className="border-t border-line">
                    <th scope="row" className="py-1.5 text-left font-normal">
                      {r.factor}× · {readableNumber(r.speed_mPerS, 3)} m/s{r.factor === 1 ? ' (this run)' : ''}
                    </th>
                    <td className="py-1.5">{r.banner ? <BannerBadge banner={r.banner} /> : 'no limit'}</td>
                    <td className="py-1.5 text-right tabular-nums">
                      {r.percent === null ? '—' : `${percentText(r.percent, 3)} (${percentText(r.percentUpper ?? r.percent, 3)})`}
                    </td>
                    <td className="py-1.5 text-right tabular-nums">{percentText(100 * r.captured, 3)}</td>
                  </tr>
                ))}
              </tbody>
            </table>
            <p className="mt-2 max-w-2xl text-sm font-semibold" data-testid="jet-sensitivity-verdict">
              {banners.size === 1
                ? 'The banner holds from half to twice the jet speed.'
                : 'The banner changes within a factor of two of the jet speed: measure the release (or its air speed) before relying on it, and judge on the cautious row.'}
            </p>
          </>
        )}
      </Section>
    </div>
  );
}

// This run's own row between the two reruns, in speed order.
function withThisRun(view: RunResult, reruns: Row[]): Row[] {
  return [reruns[0], rowOf(1, view), reruns[1]];
}
