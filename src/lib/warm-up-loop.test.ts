import { describe, expect, it } from 'vitest';
import type { PreparedScenario } from '../../workers/engine/index';
import { warmUp, type WarmingWorker, type WarmUpWork } from './warm-up-loop';

// Stand-ins for prepared scenarios: the loop only passes them on.
const scenario = (name: string) => ({ name }) as unknown as PreparedScenario;
const PIECES = [scenario('piece 0'), scenario('piece 1'), scenario('piece 2')];

// A worker whose calls are logged in the order they would reach its queue, each answered on a later task as a
// worker's reply would be; onCall lets a test act between a call and its reply (a run claiming the worker).
function fakeWorker(onCall: (n: number, w: WarmingWorker, log: string[]) => void = () => {}, failAt = -1) {
  const log: string[] = [];
  let calls = 0;
  const reply = <T>(value: T) => new Promise<T>((resolve) => setTimeout(() => resolve(value), 0));
  const w: WarmingWorker = {
    api: {
      prepare: (p) => {
        log.push(`prepare ${(p as unknown as { name: string }).name}`);
        onCall(calls++, w, log);
        return reply(undefined);
      },
      run: (b) => {
        log.push(`run ${b}`);
        onCall(calls++, w, log);
        return calls - 1 === failAt ? Promise.reject(new Error('worker failed')) : reply(1000);
      },
    },
    claimed: false,
    warming: false,
    pieces: 0,
    ownVersion: 0,
  };
  return { w, log };
}

function work(own?: { piece: PreparedScenario; version: number }): WarmUpWork & { setOwn(o: typeof own): void } {
  let current = own;
  return {
    own: () => current,
    ownBatches: 3,
    piece: (i) => PIECES[i],
    progress: (callback) => callback,
    setOwn: (o) => (current = o),
  };
}

describe('warm-up loop (src/lib/warm-up-loop.ts)', () => {
  it('sends the page’s own scenario and then every piece the way a run sends its own: prepare, then batches', async () => {
    const { w, log } = fakeWorker();
    await warmUp(w, work({ piece: scenario('own'), version: 1 }));
    expect(log).toEqual([
      'prepare own',
      'run 0',
      'run 1',
      'run 2',
      'prepare piece 0',
      'run 0',
      'prepare piece 1',
      'run 0',
      'prepare piece 2',
      'run 0',
    ]);
    expect(w).toMatchObject({ pieces: 3, ownVersion: 1, warming: false });
  });

  it('sends nothing once a run has claimed the worker, wherever the claim falls', async () => {
    // The run's prepare is logged where it would enter the worker's queue; a warm-up message after it would make the
    // run's batches run on a warm-up scenario.
    for (let at = 0; at < 10; at++) {
      const { w, log } = fakeWorker((n, worker, calls) => {
        if (n === at)
          setTimeout(() => {
            worker.claimed = true;
            calls.push('RUN prepare');
          }, 0);
      });
      await warmUp(w, work({ piece: scenario('own'), version: 1 }));
      expect(log.indexOf('RUN prepare'), `claim after call ${at}`).toBe(log.length - 1);
      expect(w.warming).toBe(false);
    }
  });

  it('starts the own scenario’s batches again when the page’s scenario changes during them', async () => {
    const w0 = work({ piece: scenario('own v1'), version: 1 });
    const { w, log } = fakeWorker((n) => {
      if (n === 2) w0.setOwn({ piece: scenario('own v2'), version: 2 });
    });
    await warmUp(w, w0);
    expect(log.slice(0, 6)).toEqual(['prepare own v1', 'run 0', 'run 1', 'prepare own v2', 'run 0', 'run 1']);
    expect(w.ownVersion).toBe(2);
  });

  it('ends quietly when a batch fails, and a second call while one goes sends nothing more', async () => {
    const { w, log } = fakeWorker(() => {}, 1);
    const first = warmUp(w, work());
    await warmUp(w, work());
    await expect(first).resolves.toBeUndefined();
    expect(log).toEqual(['prepare piece 0', 'run 0']);
    expect(w).toMatchObject({ pieces: 0, warming: false });
  });
});
