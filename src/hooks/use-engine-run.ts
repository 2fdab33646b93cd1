import { useCallback, useEffect, useState } from 'react';
import { type EngineRunState, type EngineTask, type FrameScheduler, engineRunController } from '@/lib/engine-run';
import { type RunProgress, warmUpWorkers } from '@/lib/simulation-bridge';

export type { EngineRunState, EngineTask } from '@/lib/engine-run';
export { RUN_START } from '@/lib/engine-run';

/** How often progress is drawn while a run goes. */
const PROGRESS_TICK_MS = 250;

// About four progress updates a second, each in an animation frame. Drawn at every frame, the page's own rendering
// (software-composited with no GPU) takes CPU from the workers: on two cores the downdraft bench's 160 batches took
// 2.7–3.3 s in six runs at every frame and 1.8–3.1 s in four with this tick (`npm run bench:browser`).
const progressTick: FrameScheduler = (callback) => {
  let frame = 0;
  const timer = setTimeout(() => (frame = requestAnimationFrame(callback)), PROGRESS_TICK_MS);
  return () => {
    clearTimeout(timer);
    cancelAnimationFrame(frame);
  };
};

/**
 * The page's engine run: idle → running (progress, about four updates a second) → done | cancelled |
 * failed. It warms the worker pool on mount; unmounting stops a run in flight.
 */
export function useEngineRun<R, P = RunProgress>(initialProgress: P) {
  const [state, setState] = useState<EngineRunState<R, P>>({ phase: 'idle' });
  const [controller] = useState(() => engineRunController<R, P>(setState, progressTick));
  useEffect(() => {
    warmUpWorkers();
    return controller.dispose;
  }, [controller]);
  const start = useCallback(
    (task: EngineTask<R, P>, initial: P = initialProgress) => controller.start(task, initial),
    [controller, initialProgress],
  );
  const reset = useCallback(() => {
    controller.dispose();
    setState({ phase: 'idle' });
  }, [controller]);
  return { state, start, cancel: controller.cancel, reset };
}
