import { describe, expect, it } from 'vitest';
import { type BatchWorker, RunCancelledError, scheduleBatches } from './schedule-batches';

interface FakeResult {
  batchIndex: number;
  worker: number;
  particleSteps: number;
}

// A fake worker reports halfway through each batch, then finishes after `delays[batch]` macrotasks.
function fakeWorkers(count: number, delays: number[], log: string[] = []): BatchWorker<FakeResult>[] {
  const tick = () => new Promise<void>((resolve) => setTimeout(resolve, 0));
  return Array.from({ length: count }, (_, worker) => ({
    prepare: () => void log.push(`prepare ${worker}`),
    async run(batchIndex, onProgress) {
      log.push(`run ${batchIndex} on ${worker}`);
      await tick();
      onProgress(0.5, 50);
      for (let i = 0; i < delays[batchIndex]; i++) await tick();
      if (delays[batchIndex] < 0) throw new Error(`batch ${batchIndex} broke`);
      return { batchIndex, worker, particleSteps: 100 };
    },
  }));
}

describe('scheduleBatches', () => {
  it('runs every batch once and returns them in batch order whatever finishes first', async () => {
    const log: string[] = [];
    const results = await scheduleBatches(fakeWorkers(3, [5, 0, 3, 0, 1, 0, 2], log), 7);
    expect(results.map((r) => r.batchIndex)).toEqual([0, 1, 2, 3, 4, 5, 6]);
    expect(log.filter((l) => l.startsWith('run')).length).toBe(7);
    expect(new Set(results.map((r) => r.worker)).size).toBe(3);
    expect(log.filter((l) => l.startsWith('prepare'))).toEqual(['prepare 0', 'prepare 1', 'prepare 2']);
  });

  it('prepares no more workers than there are batches', async () => {
    const log: string[] = [];
    await scheduleBatches(fakeWorkers(4, [0, 0], log), 2);
    expect(log.filter((l) => l.startsWith('prepare'))).toEqual(['prepare 0', 'prepare 1']);
  });

  it('reports progress that never decreases and ends at 1 with every step counted', async () => {
    const seen: [number, number][] = [];
    await scheduleBatches(fakeWorkers(2, [2, 0, 1, 3, 0], []), 5, { onProgress: (f, s) => seen.push([f, s]) });
    const fractions = seen.map(([f]) => f);
    expect(fractions.every((f, i) => f >= 0 && f <= 1 && (i === 0 || f >= fractions[i - 1]))).toBe(true);
    expect(seen.at(-1)).toEqual([1, 500]);
    expect(fractions).toContain(0.1);
  });

  it('rejects with RunCancelledError on abort and reports nothing afterwards', async () => {
    const controller = new AbortController();
    const seen: number[] = [];
    const run = scheduleBatches(fakeWorkers(2, [4, 4, 4, 4], []), 4, {
      signal: controller.signal,
      onProgress: (f) => {
        seen.push(f);
        controller.abort();
      },
    });
    await expect(run).rejects.toBeInstanceOf(RunCancelledError);
    const count = seen.length;
    await new Promise((resolve) => setTimeout(resolve, 20));
    expect(seen.length).toBe(count);
  });

  it('rejects before starting when the signal is already aborted', async () => {
    const controller = new AbortController();
    controller.abort();
    await expect(scheduleBatches(fakeWorkers(1, [0], []), 1, { signal: controller.signal })).rejects.toBeInstanceOf(RunCancelledError);
  });

  it('rejects with the first worker error and hands out no further batches', async () => {
    const log: string[] = [];
    await expect(scheduleBatches(fakeWorkers(2, [3, -1, 3, 3, 0, 0, 0, 0], log), 8)).rejects.toThrow('batch 1 broke');
    const handedOut = log.filter((l) => l.startsWith('run'));
    expect(handedOut).toContain('run 1 on 0');
    await new Promise((resolve) => setTimeout(resolve, 20));
    expect(log.filter((l) => l.startsWith('run'))).toEqual(handedOut);
    expect(handedOut.length).toBeLessThan(8);
  });

  it('keeps one more batch waiting in each worker while more remain than workers, and one at a time near the end', async () => {
    const log: string[] = [];
    const results = await scheduleBatches(fakeWorkers(2, [2, 2, 2, 2, 2, 2], log), 6);
    const runs = log.filter((l) => l.startsWith('run'));
    expect(runs.slice(0, 4)).toEqual(['run 0 on 0', 'run 1 on 0', 'run 2 on 1', 'run 3 on 1']);
    expect(new Set(runs.slice(4).map((l) => l.slice(-1)))).toEqual(new Set(['0', '1']));
    expect(results.map((r) => r.batchIndex)).toEqual([0, 1, 2, 3, 4, 5]);
  });
});
