import type { Trajectories } from '../../../../shared/schemas/run-result';
import { visibleFrom } from './trajectory-frames';

/** One sampled particle's known positions in time order: its release, every recorded frame, its end. */
export interface Path {
  slot: number;
  bin: number;
  /** FATES index, −1 when the result does not say. */
  fate: number;
  times_s: Float64Array;
  /** x, y, z per knot. */
  points_m: Float64Array;
}

export type Point = [number, number, number];

const ENDS = 8;

/**
 * Paths from a stored sample. Results with path ends start each path at its release and close it where
 * it was captured, settled or exhausted, so dust a hood takes between two frames still shows; older
 * results give frames only (from the first one that moves, see visibleFrom).
 */
export function buildPaths(t: Trajectories): Path[] {
  const from = t.ends ? undefined : visibleFrom(t);
  const paths: Path[] = [];
  for (let slot = 0; slot < t.particles; slot++) {
    const bin = t.bins[slot] ?? -1;
    if (bin < 0) continue;
    const times: number[] = [];
    const points: number[] = [];
    const add = (time: number, x: number, y: number, z: number) => {
      if (!Number.isFinite(time) || !Number.isFinite(x) || !Number.isFinite(y) || !Number.isFinite(z)) return;
      if (times.length && time < times[times.length - 1]) return;
      times.push(time);
      points.push(x, y, z);
    };
    const e = t.ends ? t.ends.subarray(slot * ENDS, (slot + 1) * ENDS) : undefined;
    if (e) add(e[0], e[1], e[2], e[3]);
    for (let f = from ? from[slot] : 0; f < t.frames; f++) {
      const o = (slot * t.frames + f) * 3;
      add(f * t.frameInterval_s, t.positions_m[o], t.positions_m[o + 1], t.positions_m[o + 2]);
    }
    if (e) add(e[4], e[5], e[6], e[7]);
    if (times.length === 0) continue;
    paths.push({ slot, bin, fate: t.fates?.[slot] ?? -1, times_s: Float64Array.from(times), points_m: Float64Array.from(points) });
  }
  return paths;
}

/** Last knot at or before time, −1 before the first. */
function knotBefore(p: Path, time_s: number): number {
  let lo = -1;
  let hi = p.times_s.length - 1;
  while (lo < hi) {
    const mid = (lo + hi + 1) >> 1;
    if (p.times_s[mid] <= time_s) lo = mid;
    else hi = mid - 1;
  }
  return lo;
}

function lerp(p: Path, k: number, time_s: number): Point {
  const o = k * 3;
  if (k + 1 >= p.times_s.length) return [p.points_m[o], p.points_m[o + 1], p.points_m[o + 2]];
  const span = p.times_s[k + 1] - p.times_s[k];
  const w = span > 0 ? (time_s - p.times_s[k]) / span : 0;
  return [0, 1, 2].map((i) => p.points_m[o + i] + w * (p.points_m[o + 3 + i] - p.points_m[o + i])) as Point;
}

/** Where the particle is at the time, between known positions in a straight line; undefined before release or after its end. */
export function positionAt(p: Path, time_s: number): Point | undefined {
  const last = p.times_s.length - 1;
  if (time_s < p.times_s[0] || time_s > p.times_s[last]) return undefined;
  return lerp(p, knotBefore(p, time_s), time_s);
}

/** The path between two times, oldest first, for a fading tail; empty when the particle was nowhere in between. */
export function pathBetween(p: Path, from_s: number, to_s: number): Point[] {
  const first = p.times_s[0];
  const last = p.times_s[p.times_s.length - 1];
  const a = Math.max(from_s, first);
  const b = Math.min(to_s, last);
  if (b < a) return [];
  const out: Point[] = [lerp(p, knotBefore(p, a), a)];
  for (let k = knotBefore(p, a) + 1; k < p.times_s.length && p.times_s[k] < b; k++)
    out.push([p.points_m[k * 3], p.points_m[k * 3 + 1], p.points_m[k * 3 + 2]]);
  out.push(lerp(p, knotBefore(p, b), b));
  return out;
}

/** Count of paths per fate (FATES order); the fifth entry counts paths whose fate is not recorded. */
export function fateCounts(paths: readonly Path[]): number[] {
  const counts = [0, 0, 0, 0, 0];
  for (const p of paths) counts[p.fate >= 0 && p.fate < 4 ? p.fate : 4]++;
  return counts;
}

/**
 * The frame time (k · step_s, 0 ≤ k·step_s ≤ end_s) with the most sampled particles airborne, the earliest on a
 * tie: the animation opens there rather than at t = 0, when nothing has been released yet.
 */
export function busiestTime_s(paths: readonly Path[], end_s: number, step_s: number): number {
  if (!(step_s > 0) || !(end_s > 0)) return 0;
  let best = 0;
  let most = -1;
  for (let k = 0; k * step_s <= end_s + 1e-9; k++) {
    const time_s = Math.min(end_s, k * step_s);
    let airborne = 0;
    for (const p of paths) if (positionAt(p, time_s)) airborne++;
    if (airborne > most) {
      most = airborne;
      best = time_s;
    }
  }
  return best;
}
