import { Kernel, walk } from './kernel.ts';
import type { ParticleArrays } from './release.ts';
import type { Xoshiro128 } from './rng.ts';
import type { PreparedScenario } from './types.ts';

export interface Tallies {
  zoneResidence_s: Float64Array;
  fateMass_mg: Float64Array;
  deposition_mg: Float64Array;
  trajectories: Float32Array;
  fate: Int8Array;
  particleSteps: number;
}

export type StepProgress = (fraction: number, particleSteps: number) => void;

const PROGRESS_EVERY = 1_000_000;

function swap(arr: Float64Array | Int32Array, i: number, j: number): void {
  const v = arr[i];
  arr[i] = arr[j];
  arr[j] = v;
}

// Live particles stay packed at the front: a dead one swaps with the last live one, so its final
// state ends up behind the live block and the loop never visits it again.
export function stepParticles(p: PreparedScenario, a: ParticleArrays, rng: Xoshiro128, onProgress?: StepProgress): Tallies {
  const k = new Kernel(p, a, rng);
  const ids = Int32Array.from({ length: a.count }, (_, i) => i);
  const fate = new Int8Array(a.count).fill(-1);
  const fateMass_mg = new Float64Array(4);
  const { nx, ny } = p.deposition;
  const deposition_mg = new Float64Array(nx * ny);
  const mass = p.bins.particleMass_mg;
  let live = a.count;
  let nextReport = PROGRESS_EVERY;
  while (live > 0) {
    for (let i = 0; i < live; ) {
      const f = walk(k, i);
      if (f < 0) {
        i++;
        continue;
      }
      const b = a.bin[i];
      fateMass_mg[f] += mass[b];
      if (f === 1) {
        const ix = Math.min(nx - 1, Math.floor((a.x[i] / p.room.length_m) * nx));
        const iy = Math.min(ny - 1, Math.floor((a.y[i] / p.room.width_m) * ny));
        deposition_mg[ix * ny + iy] += mass[b];
      }
      fate[ids[i]] = f;
      live--;
      swap(a.x, i, live);
      swap(a.y, i, live);
      swap(a.z, i, live);
      swap(a.t, i, live);
      swap(a.release, i, live);
      swap(a.exhaustAt, i, live);
      swap(a.bin, i, live);
      swap(a.slot, i, live);
      swap(ids, i, live);
    }
    if (onProgress && k.steps >= nextReport) {
      nextReport = k.steps + PROGRESS_EVERY;
      onProgress(progressFraction(a, live, p.duration_s), k.steps);
    }
  }
  restoreOrder(a, ids);
  return { zoneResidence_s: k.zoneResidence_s, fateMass_mg, deposition_mg, trajectories: k.trajectories, fate, particleSteps: k.steps };
}

function progressFraction(a: ParticleArrays, live: number, duration: number): number {
  let done = a.count - live;
  for (let i = 0; i < live; i++) {
    const end = Math.min(duration, a.exhaustAt[i]);
    done += end > a.release[i] ? (a.t[i] - a.release[i]) / (end - a.release[i]) : 1;
  }
  return done / a.count;
}

// Put final states back in release order so callers can line them up with particle ids.
function restoreOrder(a: ParticleArrays, ids: Int32Array): void {
  for (const arr of [a.x, a.y, a.z, a.t, a.bin]) {
    const copy = arr.slice();
    for (let i = 0; i < a.count; i++) arr[ids[i]] = copy[i];
  }
}
