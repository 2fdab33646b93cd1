import { describe, expect, it } from 'vitest';
import { eddyContinuousSource, eddyPuff } from '../../shared/physics/index';
import { meanAndError, onlyBin, prepareTest, runAll, spherePoints, windowMeans, zoneAverage } from './engine.test-helper';
import type { PreparedScenario } from './types';

// Tolerance: 3.5 standard errors of the batch mean (Student t with few batches, common practice).
const K = 3.5;

function compareWindows(p: PreparedScenario, expected: (t0: number, t1: number) => number, windows: [number, number][]) {
  const batches = runAll(p);
  for (const [from, to] of windows) {
    const { mean, se } = meanAndError(windowMeans(p, batches, from, to));
    const target = expected(from * p.timeBin_s, to * p.timeBin_s);
    expect(Math.abs(mean - target), `bins ${from}-${to}: ${mean} vs ${target} ± ${se}`).toBeLessThan(K * se);
  }
}

const noSettling = (q: PreparedScenario) => q.bins.settling_mPerS.fill(0);

describe('continuous point source in a large room (eddy diffusion, Carslaw & Jaeger from memory)', () => {
  const continuous = {
    source: { emission: { kind: 'continuous', rate_mgPerMin: 60, taskDuration_min: 10 } },
    worker: { x_m: 51, y_m: 50, z_m: 50 },
    run: { particles: 6000, batches: 8, seed: 5 },
  };

  it('follows G/(4πDr)·erfc(r/√(4Dt)) through the transient', () => {
    const p = prepareTest(continuous, noSettling);
    const D = p.bins.diffusivity_m2PerS[onlyBin(p)];
    const pts = spherePoints(51, 50, 50, 0.3, 400);
    compareWindows(
      p,
      (t0, t1) =>
        zoneAverage(pts, 50, 50, 50, t0, t1, (r, t) => eddyContinuousSource({ generation_mgPerS: 1, diffusivity_m2PerS: D }, r, t)),
      [
        [0, 30],
        [30, 60],
        [60, 120],
      ],
    );
  });

  it('reaches the steady G/(4πDr)·e^(−r√(k/D)) with first-order loss k = ACH/3600', () => {
    const p = prepareTest({ ...continuous, room: { airChanges_perH: 36 } }, noSettling);
    const D = p.bins.diffusivity_m2PerS[onlyBin(p)];
    const pts = spherePoints(51, 50, 50, 0.3, 400);
    compareWindows(
      p,
      (t0, t1) =>
        zoneAverage(pts, 50, 50, 50, t0, t1, (r, t) =>
          eddyContinuousSource({ generation_mgPerS: 1, diffusivity_m2PerS: D, lossRate_perS: 0.01 }, r, t),
        ),
      [[60, 120]],
    );
  });

  it('doubles with the floor image (2π instead of 4π) when the source sits on the floor', () => {
    const p = prepareTest({ ...continuous, source: { ...continuous.source, z_m: 0 }, worker: { x_m: 51, y_m: 50, z_m: 0.35 } }, noSettling);
    const D = p.bins.diffusivity_m2PerS[onlyBin(p)];
    const pts = spherePoints(51, 50, 0.35, 0.3, 400);
    compareWindows(
      p,
      (t0, t1) =>
        zoneAverage(pts, 50, 50, 0, t0, t1, (r, t) =>
          eddyContinuousSource({ generation_mgPerS: 1, diffusivity_m2PerS: D, boundary: 'floor' }, r, t),
        ),
      [
        [0, 30],
        [30, 120],
      ],
    );
  });
});

describe('instantaneous puff (Gaussian puff, Carslaw & Jaeger from memory)', () => {
  it('follows M/(4πDt)^(3/2)·exp(−r²/(4Dt)) at the breathing zone', () => {
    const p = prepareTest(
      { worker: { x_m: 51, y_m: 50, z_m: 50 }, run: { particles: 8000, batches: 8, duration_s: 240, seed: 9 } },
      noSettling,
    );
    const D = p.bins.diffusivity_m2PerS[onlyBin(p)];
    const pts = spherePoints(51, 50, 50, 0.3, 400);
    compareWindows(
      p,
      (t0, t1) => zoneAverage(pts, 50, 50, 50, t0, t1, (r, t) => eddyPuff({ mass_mg: 1, diffusivity_m2PerS: D }, r, t), 48),
      [
        [0, 10],
        [10, 30],
        [30, 60],
        [60, 120],
      ],
    );
  });
});
