import type { Trajectories } from '../../../../shared/schemas/run-result';

const same = (p: Float32Array, a: number, b: number) => p[a] === p[b] && p[a + 1] === p[b + 1] && p[a + 2] === p[b + 2];

/**
 * First frame to draw per particle. Engine 1.0.0 fills the frames before a particle's release with
 * its release point instead of NaN, so it would sit on the source until it moves; a moving particle
 * never repeats a position exactly, so a leading run of identical frames is pre-release.
 */
export function visibleFrom(t: Trajectories): Int32Array {
  const first = new Int32Array(t.particles);
  for (let slot = 0; slot < t.particles; slot++) {
    const base = slot * t.frames * 3;
    let f = 0;
    while (f + 1 < t.frames && Number.isFinite(t.positions_m[base + f * 3]) && same(t.positions_m, base + f * 3, base + (f + 1) * 3)) f++;
    first[slot] = f;
  }
  return first;
}

/** A playback rate (simulated s per wall-clock s) that plays the whole run in about a minute at 1×, rounded to a plain number. */
export function baseRate_sPerS(end_s: number): number {
  const wanted = end_s / 60;
  return [1, 2, 5, 10, 15, 20, 30, 60, 120, 300, 600].find((r) => r >= wanted) ?? Math.ceil(wanted / 600) * 600;
}

/** Simulated seconds advanced after dt_ms of wall time at a playback speed. */
export function advanceTime_s(rate_sPerS: number, dt_ms: number, speed: number): number {
  return (dt_ms / 1000) * rate_sPerS * speed;
}

/**
 * Splits a tail where it jumps more than half the room along x or y: the engine wraps particles
 * that leave downstream back in upstream, and a line across the whole room would be a false path.
 */
export function splitAtWrap(points: [number, number, number][], length_m: number, width_m: number): [number, number, number][][] {
  const parts: [number, number, number][][] = [];
  let current: [number, number, number][] = [];
  points.forEach((q, i) => {
    const prev = points[i - 1];
    if (prev && (Math.abs(q[0] - prev[0]) > length_m / 2 || Math.abs(q[1] - prev[1]) > width_m / 2)) {
      parts.push(current);
      current = [];
    }
    current.push(q);
  });
  parts.push(current);
  return parts.filter((part) => part.length > 1);
}
