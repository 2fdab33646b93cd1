import os from 'node:os';
import { type BatchResult, batchTally, type BatchTally, type PreparedScenario } from '../../workers/engine/index';
import { ThreadPool } from '../../workers/node/thread-pool';

// Started on the first replay and kept (a thread's start-up and JIT warm-up are paid once); two
// threads at most, so replays never take every core from the requests being served.
let pool: ThreadPool | undefined;
let queue: Promise<unknown> = Promise.resolve();

const THREADS = Math.max(1, Math.min(2, os.availableParallelism() - 1));

/**
 * Re-runs the named batches on the server's worker threads, one replay at a time, and tallies them
 * as the browser did; the batches themselves come back too (a run to a precision redoes its looks on them).
 */
export function replayBatches(
  prepared: PreparedScenario,
  batchIndices: readonly number[],
): Promise<{ tallies: BatchTally[]; batches: BatchResult[] }> {
  const next = queue.then(async () => {
    pool ??= new ThreadPool(THREADS, { background: true });
    const batches = await pool.runBatches(prepared, batchIndices);
    return { tallies: batches.map((b) => batchTally(prepared, b)), batches };
  });
  queue = next.catch(() => undefined);
  return next;
}

export async function closeReplayPool(): Promise<void> {
  const p = pool;
  pool = undefined;
  await p?.close();
}
