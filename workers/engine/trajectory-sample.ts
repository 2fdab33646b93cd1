import type { ParticleArrays } from './release';
import type { BatchResult, PreparedScenario, Results } from './types';

/** Per sampled path: release time and point, then end time and point (captured, settled, exhausted or still airborne). */
export const END_STRIDE = 8;

/** Slot → release index of the sampled particles, so their fates can be read after the walk. */
export function sampledParticles(p: PreparedScenario, slot: Int32Array, count: number): Int32Array {
  const bySlot = new Int32Array(p.trajectory.particles).fill(-1);
  for (let i = 0; i < count; i++) if (slot[i] >= 0) bySlot[slot[i]] = i;
  return bySlot;
}

const cs = (v: number) => Math.round(v * 100) / 100;

/**
 * A path lasting less than a frame interval (dust a hood takes within a second) would leave no frame
 * at all; its release and end points still draw it. Reads the states before the walk (offset 0)
 * or after it (offset 4), when stepParticles has put them back in release order.
 */
export function recordPathEnds(ends: Float32Array, sampled: Int32Array, a: ParticleArrays, when: 'release' | 'end'): void {
  const o = when === 'release' ? 0 : 4;
  sampled.forEach((i, slot) => {
    if (i < 0) return;
    const q = slot * END_STRIDE + o;
    ends[q] = cs(when === 'release' ? a.release[i] : a.t[i]);
    ends[q + 1] = cs(a.x[i]);
    ends[q + 2] = cs(a.y[i]);
    ends[q + 3] = cs(a.z[i]);
  });
}

// Whole centimetres are finer than anything a drawing shows, and short decimals keep a saved run small.
export function quantisePositions(positions_m: Float32Array): Float32Array {
  for (let i = 0; i < positions_m.length; i++) {
    const v = positions_m[i];
    if (!Number.isNaN(v)) positions_m[i] = cs(v);
  }
  return positions_m;
}

/**
 * Every batch's used slots in batch order, so the sample does not depend on which worker ran what; only the planned
 * batches' (p.batches, the first look of a run to a precision), so the sample stays about 512 paths however far a run
 * to a precision goes. With every batch's paths (until 2026-12-04) a run past 160 batches could not be saved: its JSON
 * outgrew the 8 MB the server takes (7.4 MB of paths at 160 batches of the bakery slot hood, about 30 MB at 640).
 */
export function mergeTrajectories(p: PreparedScenario, all: readonly BatchResult[]): Results['trajectories'] {
  const batches = all.filter((b) => b.batchIndex < p.batches);
  const { frames, frameInterval_s } = p.trajectory;
  const stride = frames * 3;
  let used = 0;
  for (const b of batches) for (const bin of b.trajectoryBins) if (bin >= 0) used++;
  const positions_m = new Float32Array(used * stride);
  const bins = new Int32Array(used);
  const fates = new Int32Array(used);
  const ends = new Float32Array(used * END_STRIDE);
  let k = 0;
  for (const b of batches) {
    b.trajectoryBins.forEach((bin, slot) => {
      if (bin < 0) return;
      positions_m.set(b.trajectories.subarray(slot * stride, (slot + 1) * stride), k * stride);
      bins[k] = bin;
      fates[k] = b.trajectoryFates[slot];
      ends.set(b.trajectoryEnds.subarray(slot * END_STRIDE, (slot + 1) * END_STRIDE), k * END_STRIDE);
      k++;
    });
  }
  return { particles: used, frames, frameInterval_s, positions_m, bins, fates, ends };
}
