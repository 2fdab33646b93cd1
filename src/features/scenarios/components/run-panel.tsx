import { useEffect, useRef } from 'react';
import type { Scenario } from '../../../../shared/schemas/scenario';
import type { RunResult } from '../../../../shared/schemas/run-result';
import { Button } from '@/components/ui/button';
import { ErrorMessage } from '@/components/ui/status';
import { ProgressBar, timeLeft } from '@/components/progress-bar';
import { RUN_START, useEngineRun } from '@/hooks/use-engine-run';
import { runSimulation, warmUpWorkers } from '@/lib/simulation-bridge';
import { countText, percentText } from '../../../../shared/format/index';
import { ticketedScenario, type TicketRequest } from '../api/request-run-ticket';
import { PrecisionLooks } from './precision-looks';

// A run to a precision names its aim; a fixed run its particle count.
const runLabel = (s: Scenario) =>
  s.run.precision
    ? `until ±${percentText(100 * s.run.precision.relativeHalfWidth, 2)} or decided`
    : `${countText(s.run.particles)} particles`;

type Ran = { result: RunResult; input: Scenario; ticket?: string };

const WARM_UP_AFTER_MS = 300;

/** `requestTicket`: a run that may be saved asks the server for its seed first (exploratory runs keep the scenario's own). */
export function RunPanel({
  scenario,
  onResult,
  requestTicket,
}: {
  scenario: Scenario | null;
  onResult: (r: RunResult, input: Scenario, ticket?: string) => void;
  requestTicket?: TicketRequest;
}) {
  const run = useEngineRun<Ran>(RUN_START);
  const state = run.state;
  const progress = useRef<HTMLDivElement>(null);
  const running = state.phase === 'running';
  // The Run button is disabled while running, so focus would fall to the page: it goes to the progress instead.
  useEffect(() => {
    if (running) progress.current?.focus();
  }, [running]);
  // The idle workers run a few batches of the scenario as it stands, so a first run finds the loop compiled for its
  // branches (bench:browser); after a pause in editing, not at every keystroke.
  useEffect(() => {
    if (!scenario) return;
    const timer = setTimeout(() => warmUpWorkers(scenario), WARM_UP_AFTER_MS);
    return () => clearTimeout(timer);
  }, [scenario]);

  async function start() {
    if (!scenario) return;
    const ran = await run.start(async (options) => {
      const { input, ticket } = requestTicket ? await ticketedScenario(scenario, requestTicket) : { input: scenario, ticket: undefined };
      return { result: await runSimulation(input, options), input, ticket };
    });
    if (!ran) return;
    if (ran.ticket) onResult(ran.result, ran.input, ran.ticket);
    else onResult(ran.result, ran.input);
  }

  const pct = running ? Math.round(state.progress.fraction * 100) : 0;
  return (
    <section aria-label="Run the simulation" className="rounded-lg border border-line bg-white p-4">
      <div className="flex flex-wrap items-center gap-3">
        <Button onClick={start} disabled={running || !scenario}>
          ▶ Run {scenario ? runLabel(scenario) : ''}
        </Button>
        {running && (
          <Button variant="secondary" onClick={run.cancel}>
            Cancel
          </Button>
        )}
        {!scenario && <span className="text-sm text-act">Fix the fields marked above before running.</span>}
        {state.phase === 'cancelled' && (
          <span role="status" className="text-sm text-muted">
            Run cancelled; nothing was kept.
          </span>
        )}
      </div>
      {running && (
        <div
          ref={progress}
          tabIndex={-1}
          aria-label="Run progress"
          className="mt-3 outline-none focus-visible:ring-2 focus-visible:ring-accent"
        >
          <ProgressBar label="Simulation progress" percent={pct} />
          <p className="mt-1 text-sm text-muted" aria-live="polite">
            {pct} % · {Math.round(state.progress.particlesPerS).toLocaleString()} particles/s · about {timeLeft(state.progress.secondsLeft)}{' '}
            left{state.progress.precision ? ` to ${state.progress.precision.target} batches` : ''}
          </p>
          {state.progress.precision && scenario?.run.precision && (
            <PrecisionLooks
              looks={state.progress.precision.looks}
              target={state.progress.precision.target}
              aim={scenario.run.precision.relativeHalfWidth}
            />
          )}
        </div>
      )}
      {state.phase === 'failed' && (
        <div className="mt-3">
          <ErrorMessage title="The run failed" error={state.error} />
        </div>
      )}
    </section>
  );
}
