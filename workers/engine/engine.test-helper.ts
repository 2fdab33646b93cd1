import { type ScenarioInput, parseScenario } from '../../shared/schemas/scenario';
import { batchSeries, taskMean } from './combine';
import { prepareScenario } from './prepare';
import { runBatch } from './run-batch';
import type { BatchResult, Fraction, PreparedScenario } from './types';

// Loosely typed on purpose: parseScenario checks the merged result at run time.
type Overrides = Record<string, unknown>;

/** A quiet, large, closed room with a point source: each test switches on only what it checks. */
export function testScenario(overrides: Overrides = {}) {
  const base: ScenarioInput = {
    room: {
      length_m: 100,
      width_m: 100,
      height_m: 100,
      airChanges_perH: 0,
      draftSpeed_mPerS: 0,
      eddyDiffusivity_m2PerS: 0.01,
      wallDeposition: false,
    },
    source: { x_m: 50, y_m: 50, z_m: 50, emission: { kind: 'bursts', massPerEvent_mg: 1, eventsPerHour: 1, taskDuration_min: 1 } },
    dust: { density_kgPerM3: 1000, sizeProfile: { kind: 'lognormal', basis: 'mmad', median_m: 1e-6, gsd: 1 } },
    worker: { x_m: 10, y_m: 10, z_m: 10 },
    run: { particles: 2000, batches: 4, seed: 7 },
  };
  const merged: Record<string, unknown> = { ...base };
  for (const [key, value] of Object.entries(overrides)) {
    const old = (base as Record<string, unknown>)[key];
    merged[key] =
      old && typeof old === 'object' && !Array.isArray(old) && value && typeof value === 'object' && !Array.isArray(value)
        ? { ...old, ...value }
        : value;
  }
  return parseScenario(merged);
}

// Analytic solutions take the eddy diffusivity as constant: young dust's growing diffusivity is off
// unless a test switches it back on (p.lagrangianTime_s).
export function prepareTest(overrides: Overrides = {}, tweak?: (p: PreparedScenario) => void): PreparedScenario {
  const p = prepareScenario(testScenario(overrides));
  p.lagrangianTime_s = 0;
  tweak?.(p);
  return p;
}

export function runAll(p: PreparedScenario): BatchResult[] {
  return Array.from({ length: p.batches }, (_, k) => runBatch(p, k));
}

/** The mass-carrying bin of a one-size (gsd = 1) profile. */
export function onlyBin(p: PreparedScenario): number {
  return p.bins.massFraction.findIndex((m) => m > 0.999);
}

export function meanAndError(values: readonly number[]): { mean: number; se: number } {
  const n = values.length;
  const mean = values.reduce((a, v) => a + v, 0) / n;
  const variance = values.reduce((a, v) => a + (v - mean) ** 2, 0) / (n - 1);
  return { mean, se: Math.sqrt(variance / n) };
}

/** Per-batch mean breathing-zone concentration over time bins [from, to). */
export function windowMeans(p: PreparedScenario, batches: BatchResult[], from: number, to: number, fraction: Fraction = 'total'): number[] {
  return batches.map((b) => {
    const s = batchSeries(p, b, fraction).subarray(from, to);
    return s.reduce((a, v) => a + v, 0) / s.length;
  });
}

export function batchTaskMeans(p: PreparedScenario, batches: BatchResult[], fraction: Fraction): number[] {
  return batches.map((b) => taskMean(batchSeries(p, b, fraction)));
}

/** Deterministic, nearly uniform points in a sphere (stratified radius, Fibonacci directions). */
export function spherePoints(cx: number, cy: number, cz: number, radius: number, count = 2000): [number, number, number][] {
  const points: [number, number, number][] = [];
  const golden = Math.PI * (3 - Math.sqrt(5));
  for (let i = 0; i < count; i++) {
    const r = radius * Math.cbrt((i + 0.5) / count);
    const zz = 1 - (2 * ((i * 7919) % count) + 1) / count;
    const ring = Math.sqrt(1 - zz * zz);
    const phi = i * golden;
    points.push([cx + r * ring * Math.cos(phi), cy + r * ring * Math.sin(phi), cz + r * zz]);
  }
  return points;
}

/** Average of an analytic C(r, t) over a sphere and a time window (midpoint rule in time). */
export function zoneAverage(
  points: [number, number, number][],
  sx: number,
  sy: number,
  sz: number,
  t0: number,
  t1: number,
  c: (r: number, t: number) => number,
  steps = 24,
): number {
  let sum = 0;
  for (let j = 0; j < steps; j++) {
    const t = t0 + ((j + 0.5) / steps) * (t1 - t0);
    for (const [x, y, z] of points) sum += c(Math.max(1e-6, Math.hypot(x - sx, y - sy, z - sz)), t);
  }
  return sum / (steps * points.length);
}
