import { Worker } from 'node:worker_threads';
import type { BatchResult, PreparedScenario } from '../engine/index.ts';

type ThreadMessage =
  | { type: 'progress'; batchIndex: number; fraction: number; particleSteps: number }
  | { type: 'done'; result: BatchResult };

export type PoolProgress = (fractionDone: number, particleSteps: number) => void;

// Threads do not inherit tsx's loader hooks, so each one loads the TypeScript entry through tsx's API.
function startThread(): Worker {
  const api = import.meta.resolve('tsx/esm/api');
  const entry = new URL('./batch-thread.ts', import.meta.url).href;
  const boot = `import(${JSON.stringify(api)}).then((tsx) => tsx.tsImport(${JSON.stringify(entry)}, ${JSON.stringify(import.meta.url)}));`;
  return new Worker(boot, { eval: true });
}

/** Worker threads kept alive across runs (JIT warm-up is paid once); batches go to whichever thread is free. */
export class ThreadPool {
  private readonly workers: Worker[];

  constructor(threads: number) {
    this.workers = Array.from({ length: Math.max(1, threads) }, startThread);
  }

  async run(prepared: PreparedScenario, onProgress?: PoolProgress): Promise<BatchResult[]> {
    const results: BatchResult[] = [];
    const partial = new Map<number, { fraction: number; steps: number }>();
    let next = 0;
    const report = () => {
      let fraction = results.length;
      let steps = results.reduce((a, r) => a + r.particleSteps, 0);
      for (const p of partial.values()) {
        fraction += p.fraction;
        steps += p.steps;
      }
      onProgress?.(fraction / prepared.batches, steps);
    };
    const used = this.workers.slice(0, Math.min(this.workers.length, prepared.batches));
    await Promise.all(
      used.map(
        (worker) =>
          new Promise<void>((resolve, reject) => {
            const give = () => {
              if (next < prepared.batches) worker.postMessage({ type: 'run', batchIndex: next++ });
              else finish(resolve);
            };
            const onMessage = (m: ThreadMessage) => {
              if (m.type === 'progress') partial.set(m.batchIndex, { fraction: m.fraction, steps: m.particleSteps });
              else {
                partial.delete(m.result.batchIndex);
                results.push(m.result);
                give();
              }
              report();
            };
            const finish = (then: () => void) => {
              worker.off('message', onMessage);
              worker.off('error', reject);
              then();
            };
            worker.on('error', reject);
            worker.on('message', onMessage);
            worker.postMessage({ type: 'prepare', prepared });
            give();
          }),
      ),
    );
    return results;
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
