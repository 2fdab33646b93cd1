import { Kernel, retire } from './kernel';
import type { ParticleArrays } from './release';
import type { Xoshiro128 } from './rng';
import type { PreparedScenario } from './types';
import { walk } from './walk';

export interface Tallies {
  zoneResidence_s: Float64Array;
  fateMass_mg: Float64Array;
  deposition_mg: Float64Array;
  trajectories: Float32Array;
  fate: Int8Array;
  zoneVisited: Uint8Array;
  particleSteps: number;
}

export type StepProgress = (fraction: number, particleSteps: number) => void;

const PROGRESS_EVERY = 1_000_000;

export function stepParticles(p: PreparedScenario, a: ParticleArrays, rng: Xoshiro128, onProgress?: StepProgress): Tallies {
  const k = new Kernel(p, a, rng);
  let nextReport = PROGRESS_EVERY;
  while (k.live > 0) {
    for (let i = 0; i < k.live;) {
      const f = walk(k, i);
      if (f < 0) i++;
      else retire(k, i, f);
    }
    if (onProgress && k.steps >= nextReport) {
      nextReport = k.steps + PROGRESS_EVERY;
      onProgress(progressFraction(a, k.live, p.duration_s), k.steps);
    }
  }
  restoreOrder(a, k.ids);
  return {
    zoneResidence_s: k.zoneResidence_s,
    fateMass_mg: k.fateMass_mg,
    deposition_mg: k.deposition_mg,
    trajectories: k.trajectories,
    fate: k.fate,
    zoneVisited: k.zoneVisited,
    particleSteps: k.steps,
  };
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
