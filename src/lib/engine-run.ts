import { RunCancelledError, type RunProgress } from './simulation-bridge';

/** One engine run as the page sees it; `last` is the last progress reported before it stopped (a sweep's finished points). */
export type EngineRunState<R, P = RunProgress> =
  | { phase: 'idle' }
  | { phase: 'running'; progress: P }
  | { phase: 'done'; result: R }
  | { phase: 'cancelled'; last: P }
  | { phase: 'failed'; error: unknown; last: P };

export type EngineTask<R, P = RunProgress> = (run: { signal: AbortSignal; onProgress: (progress: P) => void }) => Promise<R>;

export const RUN_START: RunProgress = { fraction: 0, particlesPerS: 0, secondsLeft: Infinity };

/** Runs `callback` before the next paint (requestAnimationFrame in a page); returns its canceller. */
export type FrameScheduler = (callback: () => void) => () => void;

interface ActiveRun<P> {
  controller: AbortController;
  last: P;
  cancelFrame?: () => void;
}

/**
 * The run state machine without React. Each start makes a new active run and everything a run
 * reports is checked against it, so the callbacks of a cancelled or replaced run, which can still
 * arrive from the workers' queues, never bring its progress bar back. Progress is coalesced to
 * one update per tick of `nextFrame`.
 */
export function engineRunController<R, P>(setState: (state: EngineRunState<R, P>) => void, nextFrame: FrameScheduler) {
  let active: ActiveRun<P> | null = null;

  const stop = (run: ActiveRun<P>) => {
    run.cancelFrame?.();
    if (active === run) active = null;
  };

  async function start(task: EngineTask<R, P>, initial: P): Promise<R | undefined> {
    if (active) cancel();
    const run: ActiveRun<P> = { controller: new AbortController(), last: initial };
    active = run;
    setState({ phase: 'running', progress: initial });
    const onProgress = (progress: P) => {
      if (active !== run) return;
      run.last = progress;
      run.cancelFrame ??= nextFrame(() => {
        run.cancelFrame = undefined;
        if (active === run) setState({ phase: 'running', progress: run.last });
      });
    };
    try {
      const result = await task({ signal: run.controller.signal, onProgress });
      if (active !== run) return undefined;
      stop(run);
      setState({ phase: 'done', result });
      return result;
    } catch (error) {
      if (active !== run) return undefined;
      stop(run);
      setState(error instanceof RunCancelledError ? { phase: 'cancelled', last: run.last } : { phase: 'failed', error, last: run.last });
      return undefined;
    }
  }

  /** Settles the page at once; the workers are stopped behind it. */
  function cancel(): void {
    const run = active;
    if (!run) return;
    stop(run);
    setState({ phase: 'cancelled', last: run.last });
    run.controller.abort();
  }

  /** For unmount: stops the run without touching state. */
  function dispose(): void {
    const run = active;
    if (!run) return;
    stop(run);
    run.controller.abort();
  }

  return { start, cancel, dispose };
}
