import * as Comlink from 'comlink';
import type { Scenario } from '../../shared/schemas/scenario.ts';
import { type BatchResult, type Results, combineBatches, prepareScenario } from '../../workers/engine/index.ts';
import type { SimulationWorkerApi } from '../../workers/simulation.worker.ts';

export interface RunProgress {
  fraction: number;
  particlesPerS: number;
  secondsLeft: number;
}

export class RunCancelledError extends Error {
  constructor() {
    super('The run was cancelled.');
    this.name = 'RunCancelledError';
  }
}

interface PooledWorker {
  worker: Worker;
  api: Comlink.Remote<SimulationWorkerApi>;
}

// Workers are kept between runs: a fresh one spends its first seconds in JIT warm-up.
const idle: PooledWorker[] = [];

function poolSize(): number {
  return Math.max(1, (navigator.hardwareConcurrency || 2) - 1);
}

function startWorker(): PooledWorker {
  const worker = new Worker(new URL('../../workers/simulation.worker.ts', import.meta.url), { type: 'module' });
  return { worker, api: Comlink.wrap<SimulationWorkerApi>(worker) };
}

export interface RunOptions {
  onProgress?: (progress: RunProgress) => void;
  signal?: AbortSignal;
}

/** Runs every batch of the scenario in the worker pool; cancelling terminates the busy workers. */
export async function runSimulation(scenario: Scenario, { onProgress, signal }: RunOptions = {}): Promise<Results> {
  const prepared = prepareScenario(scenario);
  const started = performance.now();
  const size = Math.min(poolSize(), prepared.batches);
  while (idle.length < size) idle.push(startWorker());
  const busy = idle.splice(0, size);
  const done: BatchResult[] = [];
  const partial = new Map<number, number>();
  let next = 0;

  const report = () => {
    let batchesDone = done.length;
    for (const f of partial.values()) batchesDone += f;
    const fraction = batchesDone / prepared.batches;
    const elapsed_s = (performance.now() - started) / 1000;
    const particles = fraction * prepared.particlesPerBatch * prepared.batches;
    onProgress?.({ fraction, particlesPerS: elapsed_s > 0 ? particles / elapsed_s : 0, secondsLeft: fraction > 0 ? (elapsed_s * (1 - fraction)) / fraction : Infinity });
  };

  // A busy loop never reads its message queue, so terminating is the only way to stop it.
  const stopAll = () => busy.forEach((w) => w.worker.terminate());
  let cancel = () => {};
  const cancelled = new Promise<never>((_, reject) => {
    cancel = () => {
      stopAll();
      reject(new RunCancelledError());
    };
  });
  if (signal?.aborted) cancel();
  signal?.addEventListener('abort', cancel, { once: true });

  const drain = async (w: PooledWorker) => {
    await w.api.prepare(prepared);
    while (next < prepared.batches) {
      const batchIndex = next++;
      const result = await w.api.run(batchIndex, Comlink.proxy((fraction: number) => {
        partial.set(batchIndex, fraction);
        report();
      }));
      partial.delete(batchIndex);
      done.push(result);
      report();
    }
  };

  try {
    await Promise.race([Promise.all(busy.map(drain)), cancelled]);
  } catch (error) {
    stopAll();
    throw error;
  } finally {
    signal?.removeEventListener('abort', cancel);
  }
  idle.push(...busy);
  return combineBatches(prepared, done, (performance.now() - started) / 1000);
}
