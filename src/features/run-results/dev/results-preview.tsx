import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { Spinner } from '@/components/ui/status';
import { toJsonFriendly } from '../../../../shared/schemas/runs';
import { parseScenario, type Scenario } from '../../../../shared/schemas/scenario';
import { combineBatches, prepareScenario, runBatch } from '../../../../workers/engine/index';
import { RunResults } from '@/features/run-results/components/run-results';
import { PREVIEW_SCENARIO as INPUT } from './preview-scenario';

type Options = { json: boolean; diameters: boolean; limit: boolean; hood: boolean };

function compute(o: Options): { scenario: Scenario; result: unknown } {
  const scenario = parseScenario({ ...INPUT, limit: o.limit ? INPUT.limit : undefined, hoods: o.hood ? INPUT.hoods : [] });
  const prepared = prepareScenario(scenario);
  const results = combineBatches(
    prepared,
    Array.from({ length: prepared.batches }, (_, k) => runBatch(prepared, k)),
  );
  // Without diameters the result has the shape engine 1.0.0 first stored, which views read by bin index.
  const { sizeBins: _bins, ...withoutBins } = results;
  const shown = o.diameters ? results : withoutBins;
  return { scenario, result: o.json ? JSON.parse(JSON.stringify(toJsonFriendly(shown))) : shown };
}

/** Dev-only page: runs the engine in-process and shows the results view, no server involved. */
export function ResultsPreview() {
  const [options, setOptions] = useState<Options>({ json: false, diameters: true, limit: true, hood: true });
  const [busy, setBusy] = useState(false);
  const [run, setRun] = useState<ReturnType<typeof compute>>();
  const toggle = (key: keyof Options) => setOptions((o) => ({ ...o, [key]: !o[key] }));
  const start = () => {
    setBusy(true);
    // Yield one frame so the spinner paints before the synchronous engine blocks the thread.
    setTimeout(() => {
      setRun(compute(options));
      setBusy(false);
    }, 16);
  };
  const labels: Record<keyof Options, string> = {
    json: 'As JSON from the server',
    diameters: 'Attach bin diameters',
    limit: 'With a limit',
    hood: 'With the hood',
  };
  return (
    <main className="mx-auto w-full max-w-6xl px-4 py-8 sm:px-6">
      <h1>Run results preview</h1>
      <div className="mt-4 flex flex-wrap items-center gap-4 text-sm">
        {(Object.keys(labels) as (keyof Options)[]).map((k) => (
          <label key={k} className="inline-flex items-center gap-1.5">
            <input type="checkbox" checked={options[k]} onChange={() => toggle(k)} />
            {labels[k]}
          </label>
        ))}
        <Button onClick={start} disabled={busy}>
          Compute
        </Button>
      </div>
      {busy && <Spinner label="Running the engine…" />}
      {run && <RunResults result={run.result} scenario={run.scenario} />}
    </main>
  );
}
