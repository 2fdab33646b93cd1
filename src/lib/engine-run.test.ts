import { describe, expect, it } from 'vitest';
import { type EngineRunState, type EngineTask, type FrameScheduler, engineRunController } from './engine-run';
import { RunCancelledError } from './simulation-bridge';

type State = EngineRunState<string, number>;

// Frames run only when the test says so, as a page's animation frames would.
function harness() {
  const states: State[] = [];
  let frames: (() => void)[] = [];
  const nextFrame: FrameScheduler = (callback) => {
    frames.push(callback);
    return () => (frames = frames.filter((f) => f !== callback));
  };
  const flush = () => {
    const due = frames;
    frames = [];
    due.forEach((f) => f());
  };
  const run = engineRunController<string, number>((s) => states.push(s), nextFrame);
  return { states, flush, run, pendingFrames: () => frames.length };
}

// A task the test drives by hand: report progress, finish, or fail; it rejects with RunCancelledError on abort, like runSimulation.
function manualTask() {
  let report: (p: number) => void = () => {};
  let settle: { resolve: (r: string) => void; reject: (e: unknown) => void } | undefined;
  const task: EngineTask<string, number> = ({ signal, onProgress }) => {
    report = onProgress;
    return new Promise((resolve, reject) => {
      settle = { resolve, reject };
      signal.addEventListener('abort', () => reject(new RunCancelledError()));
    });
  };
  return { task, report: (p: number) => report(p), finish: (r: string) => settle?.resolve(r), fail: (e: unknown) => settle?.reject(e) };
}

describe('engineRunController', () => {
  it('goes idle → running → done and coalesces progress to one update per frame', async () => {
    const h = harness();
    const t = manualTask();
    const done = h.run.start(t.task, 0);
    t.report(0.2);
    t.report(0.4);
    expect(h.pendingFrames()).toBe(1);
    h.flush();
    t.finish('result');
    expect(await done).toBe('result');
    expect(h.states).toEqual([
      { phase: 'running', progress: 0 },
      { phase: 'running', progress: 0.4 },
      { phase: 'done', result: 'result' },
    ]);
  });

  it('after cancel ignores late progress and the late rejection, and a new run starts cleanly', async () => {
    const h = harness();
    const first = manualTask();
    const stopped = h.run.start(first.task, 0);
    first.report(0.3);
    h.run.cancel();
    first.report(0.5);
    h.flush();
    expect(await stopped).toBeUndefined();
    expect(h.states.at(-1)).toEqual({ phase: 'cancelled', last: 0.3 });
    expect(h.pendingFrames()).toBe(0);
    h.run.cancel();
    expect(h.states.filter((s) => s.phase === 'cancelled').length).toBe(1);

    const second = manualTask();
    const done = h.run.start(second.task, 0);
    first.report(0.9);
    second.report(0.6);
    h.flush();
    second.finish('again');
    expect(await done).toBe('again');
    expect(h.states.slice(-3)).toEqual([
      { phase: 'running', progress: 0 },
      { phase: 'running', progress: 0.6 },
      { phase: 'done', result: 'again' },
    ]);
  });

  it('reports a failure with the error and the last progress', async () => {
    const h = harness();
    const t = manualTask();
    const stopped = h.run.start(t.task, 0);
    t.report(0.7);
    const error = new Error('worker crashed');
    t.fail(error);
    expect(await stopped).toBeUndefined();
    expect(h.states.at(-1)).toEqual({ phase: 'failed', error, last: 0.7 });
  });

  it('after dispose sets no state at all', async () => {
    const h = harness();
    const t = manualTask();
    const stopped = h.run.start(t.task, 0);
    h.run.dispose();
    t.report(0.5);
    h.flush();
    expect(await stopped).toBeUndefined();
    expect(h.states).toEqual([{ phase: 'running', progress: 0 }]);
  });
});
