import type { Trajectories } from '../../../../shared/schemas/run-result';

export interface Dot {
  slot: number;
  bin: number;
  x_m: number;
  y_m: number;
  z_m: number;
}

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

// The engine lays positions out as [particle][frame][xyz]; a NaN frame means the particle was not
// yet released, or had been captured, settled or exhausted.
export function frameDots(t: Trajectories, frame: number, from?: Int32Array): Dot[] {
  const dots: Dot[] = [];
  if (t.frames === 0) return dots;
  const f = Math.min(t.frames - 1, Math.max(0, Math.round(frame)));
  for (let slot = 0; slot < t.particles; slot++) {
    const bin = t.bins[slot] ?? -1;
    if (bin < 0 || (from && f < from[slot])) continue;
    const o = (slot * t.frames + f) * 3;
    const x = t.positions_m[o];
    const y = t.positions_m[o + 1];
    const z = t.positions_m[o + 2];
    if (Number.isFinite(x) && Number.isFinite(y) && Number.isFinite(z)) dots.push({ slot, bin, x_m: x, y_m: y, z_m: z });
  }
  return dots;
}

export const frameTime_s = (t: Trajectories, frame: number): number => frame * t.frameInterval_s;

/** Frames advanced after dt_ms of wall time at a playback speed, where 1× shows BASE_RATE simulated seconds per second. */
export const BASE_RATE_sPerS = 20;
export function advanceFrames(frameInterval_s: number, dt_ms: number, speed: number): number {
  return frameInterval_s > 0 ? ((dt_ms / 1000) * BASE_RATE_sPerS * speed) / frameInterval_s : 0;
}

/** The particle's last `length` airborne positions up to the frame, oldest first, for a fading tail. */
export function trail(t: Trajectories, slot: number, frame: number, length: number, from?: Int32Array): [number, number, number][] {
  const points: [number, number, number][] = [];
  const end = Math.min(t.frames - 1, Math.round(frame));
  for (let f = Math.max(0, end - length + 1, from ? from[slot] : 0); f <= end; f++) {
    const o = (slot * t.frames + f) * 3;
    if (Number.isFinite(t.positions_m[o])) points.push([t.positions_m[o], t.positions_m[o + 1], t.positions_m[o + 2]]);
  }
  return points;
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
