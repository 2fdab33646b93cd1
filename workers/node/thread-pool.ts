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

/** Runs every batch on up to `threads` worker threads, handing out batches as threads free up. */
export async function runOnThreads(prepared: PreparedScenario, threads: number, onProgress?: PoolProgress): Promise<BatchResult[]> {
  const count = Math.max(1, Math.min(threads, prepared.batches));
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
  const workers = Array.from({ length: count }, startThread);
  try {
    await Promise.all(
      workers.map(
        (worker) =>
          new Promise<void>((resolve, reject) => {
            const give = () => {
              if (next >= prepared.batches) return resolve();
              worker.postMessage({ type: 'run', batchIndex: next++ });
            };
            worker.on('error', reject);
            worker.on('message', (m: ThreadMessage) => {
              if (m.type === 'progress') {
                partial.set(m.batchIndex, { fraction: m.fraction, steps: m.particleSteps });
              } else {
                partial.delete(m.result.batchIndex);
                results.push(m.result);
                give();
              }
              report();
            });
            worker.postMessage({ type: 'prepare', prepared });
            give();
          }),
      ),
    );
  } finally {
    await Promise.all(workers.map((w) => w.terminate()));
  }
  return results;
}
