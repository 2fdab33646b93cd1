import { Worker } from 'node:worker_threads';
import type { RunPrecision } from '../../shared/schemas/scenario';
import type { BatchResult, PreparedScenario, Results } from '../engine/index';
import { runToPrecision } from '../run-to-precision';
import { type BatchWorker, scheduleBatches } from '../schedule-batches';

type ThreadMessage =
  { type: 'progress'; batchIndex: number; fraction: number; particleSteps: number } | { type: 'done'; result: BatchResult };

export type PoolProgress = (fractionDone: number, particleSteps: number) => void;

// Threads do not inherit tsx's loader hooks, so each one loads the TypeScript entry through tsx's API.
function startThread(): Worker {
  const api = import.meta.resolve('tsx/esm/api');
  const entry = new URL('./batch-thread.ts', import.meta.url).href;
  const boot = `import(${JSON.stringify(api)}).then((tsx) => tsx.tsImport(${JSON.stringify(entry)}, ${JSON.stringify(import.meta.url)}));`;
  return new Worker(boot, { eval: true });
}

interface Pending {
  batchIndex: number;
  onProgress: (fraction: number, particleSteps: number) => void;
  resolve: (result: BatchResult) => void;
  reject: (error: unknown) => void;
}

/**
 * One thread in the scheduler's terms. A thread runs one batch at a time, in the order asked; the scheduler may ask
 * for the next before the current one is done (it waits in the thread's queue), so each reply finds its batch by index.
 */
function threadWorker(thread: Worker, prepared: PreparedScenario): BatchWorker<BatchResult> & { detach(): void } {
  const pending: Pending[] = [];
  // Matched by batch index, so a reply to an earlier pool call's batch (one left queued when that call failed) is ignored.
  const onMessage = (m: ThreadMessage) => {
    const index = m.type === 'progress' ? m.batchIndex : m.result.batchIndex;
    const k = pending.findIndex((p) => p.batchIndex === index);
    if (k < 0) return;
    if (m.type === 'progress') pending[k].onProgress(m.fraction, m.particleSteps);
    else pending.splice(k, 1)[0].resolve(m.result);
  };
  const onError = (error: unknown) => pending.splice(0).forEach((p) => p.reject(error));
  thread.on('message', onMessage);
  thread.on('error', onError);
  return {
    prepare: () => thread.postMessage({ type: 'prepare', prepared }),
    run: (batchIndex, onProgress) =>
      new Promise<BatchResult>((resolve, reject) => {
        pending.push({ batchIndex, onProgress, resolve, reject });
        thread.postMessage({ type: 'run', batchIndex });
      }),
    detach() {
      thread.off('message', onMessage);
      thread.off('error', onError);
    },
  };
}

/** Worker threads kept alive across runs (JIT warm-up is paid once); batches go to whichever thread is free. */
export class ThreadPool {
  private readonly workers: Worker[];

  /** `background`: idle threads do not keep the process alive (a server's pool). */
  constructor(threads: number, opts: { background?: boolean } = {}) {
    this.workers = Array.from({ length: Math.max(1, threads) }, startThread);
    if (opts.background) this.workers.forEach((w) => w.unref());
  }

  async run(prepared: PreparedScenario, onProgress?: PoolProgress): Promise<BatchResult[]> {
    return this.runRange(prepared, 0, prepared.batches, onProgress);
  }

  /** Batches first…first+count−1 of the scenario's seed stream, in batch order. */
  runRange(prepared: PreparedScenario, first: number, count: number, onProgress?: PoolProgress): Promise<BatchResult[]> {
    return this.runBatches(
      prepared,
      Array.from({ length: count }, (_, k) => first + k),
      onProgress,
    );
  }

  /** Only the named batches (a replay's sample), returned in the order named. One call at a time per pool. */
  async runBatches(prepared: PreparedScenario, batchIndices: readonly number[], onProgress?: PoolProgress): Promise<BatchResult[]> {
    const threads = this.workers.slice(0, Math.min(this.workers.length, batchIndices.length)).map((w) => threadWorker(w, prepared));
    const named = threads.map((t) => ({ prepare: t.prepare, run: (i: number, report: PoolProgress) => t.run(batchIndices[i], report) }));
    try {
      return await scheduleBatches(named, batchIndices.length, { onProgress });
    } finally {
      threads.forEach((t) => t.detach());
    }
  }

  /** The scenario run to its precision rule (workers/run-to-precision.ts). */
  runToPrecision(prepared: PreparedScenario, rule: RunPrecision, onLook?: Parameters<typeof runToPrecision>[3]): Promise<Results> {
    const started = performance.now();
    return runToPrecision(
      prepared,
      rule,
      (first, count) => this.runRange(prepared, first, count),
      onLook,
      () => (performance.now() - started) / 1000,
    );
  }

  async close(): Promise<void> {
    await Promise.all(this.workers.map((w) => w.terminate()));
  }
}

/** One-off run: start `threads` threads, run every batch, stop the threads. */
export async function runOnThreads(prepared: PreparedScenario, threads: number, onProgress?: PoolProgress): Promise<BatchResult[]> {
  const pool = new ThreadPool(Math.min(threads, prepared.batches));
  try {
    return await pool.run(prepared, onProgress);
  } finally {
    await pool.close();
  }
}
