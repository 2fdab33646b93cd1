/** A worker as the scheduler sees it: the browser's Web Workers and Node's threads both fit. */
export interface BatchWorker<R> {
  prepare(): void | Promise<void>;
  run(batchIndex: number, onProgress: (fraction: number, particleSteps: number) => void): Promise<R>;
}

/** The part of AbortSignal the scheduler uses, so it needs neither DOM nor Node types. */
export interface CancelSignal {
  readonly aborted: boolean;
  addEventListener(type: 'abort', listener: () => void, options?: { once?: boolean }): void;
  removeEventListener(type: 'abort', listener: () => void): void;
}

export interface ScheduleOptions {
  /** Share of all batches done (partial batches count by their own share) and particle-steps so far; never decreases. */
  onProgress?: (fraction: number, particleSteps: number) => void;
  signal?: CancelSignal;
  /** Index of the first batch: a run to a precision adds batches first…first+batches−1 to the ones it has. */
  first?: number;
}

export class RunCancelledError extends Error {
  constructor() {
    super('The run was cancelled.');
    this.name = 'RunCancelledError';
  }
}

/**
 * Hands batch indices first…first+batches−1 (first is 0 unless given) to whichever worker is free and returns the results in batch
 * order, so nothing downstream depends on how many workers ran or which finished first. The first
 * worker error or a cancel rejects at once; the caller stops the workers (a busy loop cannot be
 * interrupted from here), and anything they report afterwards is ignored.
 */
export async function scheduleBatches<R extends { particleSteps: number }>(
  workers: readonly BatchWorker<R>[],
  batches: number,
  { onProgress, signal, first = 0 }: ScheduleOptions = {},
): Promise<R[]> {
  if (workers.length === 0 && batches > 0) throw new RangeError('scheduleBatches needs at least one worker');
  const results: R[] = new Array(batches);
  const partial = new Map<number, { fraction: number; steps: number }>();
  let finished = 0;
  let finishedSteps = 0;
  let next = 0;
  let settled = false;
  let lastFraction = 0;

  const report = () => {
    if (settled || !onProgress) return;
    let fraction = finished;
    let steps = finishedSteps;
    for (const p of partial.values()) {
      fraction += p.fraction;
      steps += p.steps;
    }
    // Shares come from the workers' own reports; the scheduler never lets the total step back.
    lastFraction = Math.max(lastFraction, Math.min(1, fraction / batches));
    onProgress(lastFraction, steps);
  };

  // The first worker error rejects the run at once, whichever batch it came from (one may be waiting in a queue).
  let fail = (_error: unknown) => {};
  const failed = new Promise<never>((_, reject) => {
    fail = reject;
  });
  const take = (worker: BatchWorker<R>) => {
    if (settled || next >= batches) return null;
    const batchIndex = next++;
    const result = worker.run(first + batchIndex, (fraction, steps) => {
      if (settled || results[batchIndex]) return;
      partial.set(batchIndex, { fraction, steps });
      report();
    });
    result.catch(fail);
    return { batchIndex, result };
  };

  const drain = async (worker: BatchWorker<R>) => {
    await worker.prepare();
    let current = take(worker);
    while (current) {
      // While plenty remain, one more batch waits in the worker's queue, so it starts the next the moment it finishes
      // instead of waiting for this thread to hear back and send one (about 5 ms a batch in a busy page). Near the end
      // each worker takes one at a time, so none is left holding two while another has none.
      const queued = next < batches - workers.length ? take(worker) : null;
      const result = await current.result;
      if (settled) return;
      partial.delete(current.batchIndex);
      results[current.batchIndex] = result;
      finished++;
      finishedSteps += result.particleSteps;
      report();
      current = queued ?? take(worker);
    }
  };

  let onAbort = () => {};
  const cancelled = new Promise<never>((_, reject) => {
    onAbort = () => reject(new RunCancelledError());
  });
  if (signal?.aborted) onAbort();
  signal?.addEventListener('abort', onAbort, { once: true });
  try {
    await Promise.race([Promise.all(workers.slice(0, batches).map(drain)), cancelled, failed]);
  } finally {
    settled = true;
    signal?.removeEventListener('abort', onAbort);
  }
  return results;
}
