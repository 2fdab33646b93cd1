import * as Comlink from 'comlink';
import type { RunPrecision, Scenario } from '../../shared/schemas/scenario';
import type { RunResult } from '../../shared/schemas/run-result';
import { type BatchResult, combineBatches, type PreparedScenario, prepareScenario, withBatchTallies } from '../../workers/engine/index';
import { FIRST_LOOK_BATCHES, type LookOutcome, runToPrecision } from '../../workers/run-to-precision';
import { OWN_WARM_UP_BATCHES, ownWarmUpPiece, warmUpPieces } from '../../workers/warm-up-pieces';
import { type BatchWorker, scheduleBatches } from '../../workers/schedule-batches';
import type { SimulationWorkerApi } from '../../workers/simulation.worker';
import { warmUp, type WarmingWorker, type WarmUpWork } from './warm-up-loop';

export interface RunProgress {
  fraction: number;
  particlesPerS: number;
  secondsLeft: number;
  /** A run to a precision: the batch count it is working toward and the looks so far, each with its interval. */
  precision?: { target: number; looks: LookOutcome[] };
}

export { RunCancelledError } from '../../workers/schedule-batches';

interface PooledWorker extends WarmingWorker {
  worker: Worker;
  api: Comlink.Remote<SimulationWorkerApi>;
}

// Workers are kept between runs: a fresh one spends its first seconds in JIT warm-up.
const idle: PooledWorker[] = [];
// Workers a run has taken from the pool: they count towards its size, so a page that warms up while a run goes
// (a results section mounting) starts no extra workers to compete with the run's for the cores.
let lent = 0;

// One worker per hardware thread but the page's own, and never fewer than two: the page sits idle
// while a run goes (it only draws progress), and on a two-core machine two workers reach a decision
// about 1.5× sooner than one (`npm run bench:browser` with 1,000-particle batches: 2.0–7.0 s against 2.5–10.9 s over the demos).
function poolSize(): number {
  return Math.max(2, (navigator.hardwareConcurrency || 2) - 1);
}

function startWorker(warm: boolean): PooledWorker {
  const worker = new Worker(new URL('../../workers/simulation.worker.ts', import.meta.url), { type: 'module' });
  const pooled: PooledWorker = {
    worker,
    api: Comlink.wrap<SimulationWorkerApi>(worker),
    claimed: !warm,
    warming: false,
    pieces: 0,
    ownVersion: 0,
  };
  // A fresh worker runs its first steps in the interpreter; started ahead of a run, it takes the
  // warm-up pieces (workers/warm-up-pieces.ts: every hood kind, bursts, a jet) one at a time, so the
  // step loop is compiled for every branch before real work, which waits for one piece at most.
  if (warm) void warmUp(pooled, warmUpWork);
  return pooled;
}

let warmUpScenarios: ReturnType<typeof warmUpPieces> | undefined;
const warmUpPrepared: PreparedScenario[] = [];
// The page's own scenario as a warm-up (workers/warm-up-pieces.ts ownWarmUpPiece), newest first.
let ownPiece: PreparedScenario | undefined;
let ownVersion = 0;

const warmUpWork: WarmUpWork = {
  own: () => (ownPiece ? { piece: ownPiece, version: ownVersion } : undefined),
  ownBatches: OWN_WARM_UP_BATCHES,
  piece: (i) => {
    warmUpScenarios ??= warmUpPieces();
    if (i >= warmUpScenarios.length) return undefined;
    // Prepared as each piece is sent, not all at page start (about 100 ms of the page's thread together).
    return (warmUpPrepared[i] ??= prepareScenario(warmUpScenarios[i]));
  },
  progress: (callback) => Comlink.proxy(callback),
};

/**
 * Starts the pool's workers ahead of the first run (pages that run the engine call it on mount); with the page's
 * scenario, idle workers also take a few batches of it before the generic pieces, and again when it changes.
 */
export function warmUpWorkers(scenario?: Scenario | null): void {
  while (idle.length + lent < poolSize()) idle.push(startWorker(true));
  if (scenario) {
    try {
      ownPiece = prepareScenario(ownWarmUpPiece(scenario));
      ownVersion++;
    } catch {
      return; // a scenario that does not prepare has nothing to warm up on
    }
  }
  for (const w of idle) if (!w.claimed) void warmUp(w, warmUpWork);
}

export interface RunOptions {
  onProgress?: (progress: RunProgress) => void;
  signal?: AbortSignal;
}

/** Runs every batch of the scenario in the worker pool; cancelling terminates the busy workers. */
export async function runSimulation(scenario: Scenario, { onProgress, signal }: RunOptions = {}): Promise<RunResult> {
  const prepared = prepareScenario(scenario);
  const started = performance.now();
  const size = Math.min(poolSize(), scenario.run.precision ? FIRST_LOOK_BATCHES : prepared.batches);
  // Workers started here go straight to the run: a warm-up would only come before it.
  while (idle.length < size) idle.push(startWorker(false));
  const busy = idle.splice(0, size);
  lent += busy.length;
  for (const w of busy) w.claimed = true;
  const particles = prepared.particlesPerBatch * prepared.batches;
  const report = (fraction: number) => {
    const elapsed_s = (performance.now() - started) / 1000;
    onProgress?.({
      fraction,
      particlesPerS: elapsed_s > 0 ? (fraction * particles) / elapsed_s : 0,
      secondsLeft: fraction > 0 ? (elapsed_s * (1 - fraction)) / fraction : Infinity,
    });
  };
  const workers = busy.map(({ api }): BatchWorker<BatchResult> => {
    // Sent once a run, not again at each look of a run to a precision.
    let ready: Promise<void> | undefined;
    return {
      prepare: () => (ready ??= api.prepare(prepared)),
      run: (batchIndex: number, onBatchProgress: (fraction: number, steps: number) => void) =>
        api.run(batchIndex, Comlink.proxy(onBatchProgress)),
    };
  });
  const elapsed_s = () => (performance.now() - started) / 1000;
  try {
    const result = scenario.run.precision
      ? await runToPrecisionOn(workers, prepared, scenario.run.precision, { signal, onProgress }, elapsed_s)
      : await scheduleBatches(workers, prepared.batches, { signal, onProgress: onProgress && report }).then((done) =>
          // Each batch's figures and hash travel with the result: the server replays a sample before it keeps a run.
          withBatchTallies(prepared, combineBatches(prepared, done, elapsed_s()), done),
        );
    // Back in the pool, a worker may warm up again when the page's scenario changes.
    for (const w of busy) w.claimed = false;
    lent -= busy.length;
    idle.push(...busy);
    return result;
  } catch (error) {
    // A busy loop never reads its message queue, so terminating is the only way to stop it; the
    // replacements start now rather than at the next run.
    busy.forEach((w) => w.worker.terminate());
    lent -= busy.length;
    warmUpWorkers();
    throw error;
  }
}

/**
 * The pool's side of a run to a precision: each look's batches go to the same workers, and
 * progress counts toward the look being filled, with every finished look's interval beside it.
 */
function runToPrecisionOn(
  workers: BatchWorker<BatchResult>[],
  prepared: PreparedScenario,
  rule: RunPrecision,
  { signal, onProgress }: RunOptions,
  elapsed_s: () => number,
): Promise<RunResult> {
  const looks: LookOutcome[] = [];
  const runBatches = (first: number, count: number) => {
    const target = first + count;
    return scheduleBatches(workers, count, {
      first,
      signal,
      onProgress: (fraction) => {
        const t = elapsed_s();
        const particles = (first + fraction * count) * prepared.particlesPerBatch;
        const share = (first + fraction * count) / target;
        onProgress?.({
          fraction: share,
          particlesPerS: t > 0 ? particles / t : 0,
          secondsLeft: share > 0 ? (t * (1 - share)) / share : Infinity,
          precision: { target, looks: [...looks] },
        });
      },
    });
  };
  return runToPrecision(prepared, rule, runBatches, (outcome) => looks.push(outcome), elapsed_s);
}
