import { formatSig, percentText } from '../../../../shared/format/index';
import { parseScenario } from '../../../../shared/schemas/scenario';
import { Cautions } from '@/components/cautions';
import { Button } from '@/components/ui/button';
import { ProgressBar } from '@/components/progress-bar';
import { RUN_START, useEngineRun } from '@/hooks/use-engine-run';
import { runSimulation } from '@/lib/simulation-bridge';
import type { RunResult } from '../../../../shared/schemas/run-result';
// Raw text keeps the JSON out of the TypeScript project graph; the schema checks it on load.
import defaultScenarioText from '../../../../shared/demo-scenarios/default.json?raw';

const scenario = parseScenario(JSON.parse(defaultScenarioText));

const mg = (v: number) => formatSig(v, 3);
const pct = (v: number) => percentText(100 * v);

function ResultSummary({ results }: { results: RunResult }) {
  const r = results.breathingZone.fractions.respirable;
  const { fate } = results;
  return (
    <section data-testid="engine-result" className="mt-6 space-y-3 rounded-lg border border-line bg-white p-4">
      <p>
        Respirable 8-h TWA: <strong>{mg(r.twa8h_mgPerM3)} mg/m³</strong> (95 % CI {mg(r.twa8hCi95_mgPerM3[0])} to{' '}
        {mg(r.twa8hCi95_mgPerM3[1])} mg/m³)
      </p>
      {results.limit && (
        <p>
          {percentText(results.limit.percentOfLimit)} of the {results.limit.value_mgPerM3} mg/m³ limit; banner:{' '}
          <strong>{results.limit.banner}</strong>
        </p>
      )}
      <p className="text-sm text-muted">
        Fate of {fate.emitted_mg.toFixed(0)} mg emitted: captured {pct(fate.captured)}, settled {pct(fate.settled)}, exhausted{' '}
        {pct(fate.exhausted)}, airborne {pct(fate.airborne)}
      </p>
      <p className="text-sm text-muted">
        {results.engine.particles.toLocaleString()} particles in {results.engine.batches} batches,{' '}
        {(results.performance.particleSteps / 1e6).toFixed(1)} M particle-steps in {results.performance.wallTime_s.toFixed(1)} s
      </p>
    </section>
  );
}

export function EngineCheckPage() {
  const run = useEngineRun<RunResult>(RUN_START);
  const state = run.state;
  const start = () => void run.start((options) => runSimulation(scenario, options));

  const percent = state.phase === 'running' ? Math.round(100 * state.progress.fraction) : 0;
  return (
    <main className="mx-auto max-w-3xl bg-paper p-8 text-ink">
      <h1 className="text-2xl font-semibold">Engine check</h1>
      <p className="mt-1 text-muted">{scenario.name}</p>
      <div className="mt-4 flex gap-3">
        <Button onClick={start} disabled={state.phase === 'running'}>
          Run
        </Button>
        <Button variant="secondary" onClick={run.cancel} disabled={state.phase !== 'running'}>
          Cancel
        </Button>
      </div>
      {state.phase === 'running' && (
        <div className="mt-4">
          <ProgressBar label="Simulation progress" percent={percent} look="slim" />
          <p className="mt-1 text-sm text-muted">
            {percent} % · {Math.round(state.progress.particlesPerS).toLocaleString()} particles/s
            {Number.isFinite(state.progress.secondsLeft) && ` · about ${Math.ceil(state.progress.secondsLeft)} s left`}
          </p>
        </div>
      )}
      {state.phase === 'cancelled' && <p className="mt-4 text-muted">Cancelled.</p>}
      {state.phase === 'failed' && (
        <p role="alert" className="mt-4 text-act">
          Run failed: {state.error instanceof Error ? state.error.message : String(state.error)}
        </p>
      )}
      {state.phase === 'done' && <ResultSummary results={state.result} />}
      <Cautions compact />
    </main>
  );
}
