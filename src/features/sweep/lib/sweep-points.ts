import type { Hood, Scenario } from '../../../../shared/schemas/scenario';
import { hoodAxis } from '../../../../shared/schemas/hood-axis';

export type SweepParameter = 'distance' | 'airflow' | 'faceScale';

/** Values are SI: distance_m in metres, airflow in m³/s, faceScale a factor on the current width and height. */
export interface SweepSpec {
  hoodIndex: number;
  parameter: SweepParameter;
  from: number;
  to: number;
  count: number;
}

export interface SweepPoint {
  index: number;
  value: number;
  scenario: Scenario;
}

export const MIN_POINTS = 3;
export const MAX_POINTS = 12;
// A face closer than this to the source sits inside the release box of most demo sources.
export const MIN_DISTANCE_m = 0.02;

/** Distance from the face centre to the source measured along the hood axis (positive in front). */
export function sourceDistance_m(scenario: Scenario, hoodIndex: number): number {
  const hood = hoodAt(scenario, hoodIndex);
  const n = hoodAxis(hood.direction);
  const s = scenario.source;
  return (s.x_m - hood.x_m) * n[0] + (s.y_m - hood.y_m) * n[1] + (s.z_m - hood.z_m) * n[2];
}

/** Distances at which the face centre, slid along its axis, stays inside the room. */
export function distanceRange_m(scenario: Scenario, hoodIndex: number): [number, number] {
  const hood = hoodAt(scenario, hoodIndex);
  const n = hoodAxis(hood.direction);
  const d0 = sourceDistance_m(scenario, hoodIndex);
  const at = [hood.x_m, hood.y_m, hood.z_m];
  const size = [scenario.room.length_m, scenario.room.width_m, scenario.room.height_m];
  // The face moves by (d0 − d)·n, so each axis bounds the shift t = d0 − d.
  let tMin = -Infinity;
  let tMax = Infinity;
  for (let k = 0; k < 3; k++) {
    if (Math.abs(n[k]) < 1e-12) continue;
    const a = (0 - at[k]) / n[k];
    const b = (size[k] - at[k]) / n[k];
    tMin = Math.max(tMin, Math.min(a, b));
    tMax = Math.min(tMax, Math.max(a, b));
  }
  return [Math.max(MIN_DISTANCE_m, d0 - tMax), d0 - tMin];
}

/** Evenly spaced values with both ends exact, so the table shows the numbers the engineer typed. */
export function sweepValues(from: number, to: number, count: number): number[] {
  if (!Number.isInteger(count) || count < MIN_POINTS || count > MAX_POINTS)
    throw new RangeError(`count must be a whole number from ${MIN_POINTS} to ${MAX_POINTS}, got ${count}`);
  if (!Number.isFinite(from) || !Number.isFinite(to) || from === to)
    throw new RangeError(`from and to must be two different numbers, got ${from} and ${to}`);
  return Array.from({ length: count }, (_, i) => (i === count - 1 ? to : from + ((to - from) * i) / (count - 1)));
}

function hoodAt(scenario: Scenario, hoodIndex: number): Hood {
  const hood = scenario.hoods[hoodIndex];
  if (!hood) throw new RangeError(`hoodIndex must name one of the scenario's ${scenario.hoods.length} hoods, got ${hoodIndex}`);
  return hood;
}

function withHood(scenario: Scenario, hoodIndex: number, change: (hood: Hood) => Hood): Scenario {
  const copy = structuredClone(scenario);
  copy.hoods[hoodIndex] = change(copy.hoods[hoodIndex]);
  return copy;
}

function moveTo(scenario: Scenario, hoodIndex: number, distance_m: number): Scenario {
  const [lo, hi] = distanceRange_m(scenario, hoodIndex);
  if (!(distance_m >= lo - 1e-9 && distance_m <= hi + 1e-9))
    throw new RangeError(
      `distance ${distance_m} m would put the hood face outside the room; keep it between ${lo.toFixed(3)} and ${hi.toFixed(3)} m`,
    );
  const n = hoodAxis(scenario.hoods[hoodIndex].direction);
  const shift = sourceDistance_m(scenario, hoodIndex) - distance_m;
  return withHood(scenario, hoodIndex, (h) => ({ ...h, x_m: h.x_m + shift * n[0], y_m: h.y_m + shift * n[1], z_m: h.z_m + shift * n[2] }));
}

// Every point keeps the scenario's seed: common random numbers make the differences between points sharper than each point's own error.
export function buildSweepPoints(scenario: Scenario, spec: SweepSpec): SweepPoint[] {
  hoodAt(scenario, spec.hoodIndex);
  return sweepValues(spec.from, spec.to, spec.count).map((value, index) => {
    if (!(value > 0)) throw new RangeError(`every ${spec.parameter} value must be above zero, got ${value}`);
    const point =
      spec.parameter === 'distance'
        ? moveTo(scenario, spec.hoodIndex, value)
        : spec.parameter === 'airflow'
          ? withHood(scenario, spec.hoodIndex, (h) => ({ ...h, airflow_m3PerS: value }))
          : withHood(scenario, spec.hoodIndex, (h) => ({ ...h, faceWidth_m: h.faceWidth_m * value, faceHeight_m: h.faceHeight_m * value }));
    return { index, value, scenario: point };
  });
}
