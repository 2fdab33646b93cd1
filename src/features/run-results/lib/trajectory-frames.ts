import type { RunView } from './normalise-result.ts';

export interface Dot {
  slot: number;
  bin: number;
  x_m: number;
  y_m: number;
  z_m: number;
}

type Trajectories = RunView['trajectories'];

// The engine lays positions out as [particle][frame][xyz]; a NaN frame means the particle was not
// yet released, or had been captured, settled or exhausted.
export function frameDots(t: Trajectories, frame: number): Dot[] {
  const dots: Dot[] = [];
  if (t.frames === 0) return dots;
  const f = Math.min(t.frames - 1, Math.max(0, Math.round(frame)));
  for (let slot = 0; slot < t.particles; slot++) {
    const bin = t.bins[slot] ?? -1;
    if (bin < 0) continue;
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
  return frameInterval_s > 0 ? (dt_ms / 1000) * BASE_RATE_sPerS * speed / frameInterval_s : 0;
}
