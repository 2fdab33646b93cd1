import { useCallback, useEffect, useState } from 'react';
import { type EngineRunState, type EngineTask, type FrameScheduler, engineRunController } from '@/lib/engine-run';
import { type RunProgress, warmUpWorkers } from '@/lib/simulation-bridge';

export type { EngineRunState, EngineTask } from '@/lib/engine-run';
export { RUN_START } from '@/lib/engine-run';

const animationFrame: FrameScheduler = (callback) => {
  const id = requestAnimationFrame(callback);
  return () => cancelAnimationFrame(id);
};

/**
 * The page's engine run: idle → running (progress, one update per frame) → done | cancelled |
 * failed. It warms the worker pool on mount; unmounting stops a run in flight.
 */
export function useEngineRun<R, P = RunProgress>(initialProgress: P) {
  const [state, setState] = useState<EngineRunState<R, P>>({ phase: 'idle' });
  const [controller] = useState(() => engineRunController<R, P>(setState, animationFrame));
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
