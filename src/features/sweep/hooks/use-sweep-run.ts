import { useCallback, useEffect, useRef, useState } from 'react';
import { RunCancelledError, runSimulation, warmUpWorkers } from '../../../lib/simulation-bridge';
import { pointResult, type PointResult } from '../lib/point-result';
import type { SweepPoint } from '../lib/sweep-points';

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

/** Runs the points one after another so each gets the whole worker pool; one abort stops the lot. */
export function useSweepRun() {
  const [state, setState] = useState<SweepState>({ phase: 'idle' });
  const abort = useRef<AbortController | null>(null);
  useEffect(() => {
    warmUpWorkers();
    return () => abort.current?.abort();
  }, []);

  const start = useCallback(async (points: SweepPoint[]) => {
    abort.current?.abort();
    const controller = new AbortController();
    abort.current = controller;
    const results: PointResult[] = [];
    const started = performance.now();
    const progress = (fraction: number): SweepProgress => {
      const elapsed_s = (performance.now() - started) / 1000;
      return { fraction, pointsDone: results.length, points: points.length, secondsLeft: fraction > 0 ? (elapsed_s * (1 - fraction)) / fraction : Infinity };
    };
    setState({ phase: 'running', progress: progress(0), results: [] });
    try {
      for (const point of points) {
        const run = await runSimulation(point.scenario, {
          signal: controller.signal,
          onProgress: (p) => setState({ phase: 'running', progress: progress((results.length + p.fraction) / points.length), results: [...results] }),
        });
        results.push(pointResult(run));
        setState({ phase: 'running', progress: progress(results.length / points.length), results: [...results] });
      }
      setState({ phase: 'done', results });
    } catch (error) {
      setState(error instanceof RunCancelledError ? { phase: 'cancelled', results } : { phase: 'failed', error, results });
    }
  }, []);

  const cancel = useCallback(() => abort.current?.abort(), []);
  const reset = useCallback(() => setState({ phase: 'idle' }), []);
  return { state, start, cancel, reset };
}
