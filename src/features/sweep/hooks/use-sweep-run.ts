import { useCallback } from 'react';
import { type EngineRunState, useEngineRun } from '@/hooks/use-engine-run';
import { runSimulation } from '@/lib/simulation-bridge';
import { pointResult, type PointResult } from '@/features/sweep/lib/point-result';
import type { SweepPoint } from '@/features/sweep/lib/sweep-points';

export interface SweepProgress {
  fraction: number;
  pointsDone: number;
  points: number;
  secondsLeft: number;
}

export type SweepState =
  | { phase: 'idle' }
  | { phase: 'running'; progress: SweepProgress; results: PointResult[] }
  | { phase: 'done'; results: PointResult[] }
  | { phase: 'cancelled'; results: PointResult[] }
  | { phase: 'failed'; error: unknown; results: PointResult[] };

type Progress = SweepProgress & { results: PointResult[] };

const START: Progress = { fraction: 0, pointsDone: 0, points: 0, secondsLeft: Infinity, results: [] };

function sweepState(state: EngineRunState<PointResult[], Progress>): SweepState {
  switch (state.phase) {
    case 'idle':
      return state;
    case 'running':
      return { phase: 'running', progress: state.progress, results: state.progress.results };
    case 'done':
      return { phase: 'done', results: state.result };
    case 'cancelled':
      return { phase: 'cancelled', results: state.last.results };
    case 'failed':
      return { phase: 'failed', error: state.error, results: state.last.results };
  }
}

/** Runs the points one after another so each gets the whole worker pool; one cancel stops the lot. */
export function useSweepRun() {
  const run = useEngineRun<PointResult[], Progress>(START);
  const { start: startRun } = run;

  const start = useCallback(
    (points: SweepPoint[]) =>
      startRun(
        async ({ signal, onProgress }) => {
          const results: PointResult[] = [];
          const started = performance.now();
          const progress = (fraction: number): Progress => {
            const elapsed_s = (performance.now() - started) / 1000;
            return {
              fraction,
              pointsDone: results.length,
              points: points.length,
              secondsLeft: fraction > 0 ? (elapsed_s * (1 - fraction)) / fraction : Infinity,
              results: [...results],
            };
          };
          onProgress(progress(0));
          for (const point of points) {
            const result = await runSimulation(point.scenario, {
              signal,
              onProgress: (p) => onProgress(progress((results.length + p.fraction) / points.length)),
            });
            results.push(pointResult(result));
            onProgress(progress(results.length / points.length));
          }
          return results;
        },
        { ...START, points: points.length },
      ),
    [startRun],
  );

  return { state: sweepState(run.state), start, cancel: run.cancel, reset: run.reset };
}
