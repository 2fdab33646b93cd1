import { Kernel, retire } from './kernel';
import type { ParticleArrays } from './release';
import type { Xoshiro128 } from './rng';
import type { PreparedScenario } from './types';
import { walk } from './walk';
import { REWEIGHT, reweight, tierAt } from './importance';

export interface Tallies {
  zoneResidence_s: Float64Array;
  fateMass_mg: Float64Array;
  deposition_mg: Float64Array;
  trajectories: Float32Array;
  fate: Int8Array;
  zoneVisited: Uint8Array;
  particleSteps: number;
  /** Split copies made and particles that roulette removed (variance reduction). */
  copies: number;
  rouletteRemoved: number;
}

export type StepProgress = (fraction: number, particleSteps: number) => void;

const PROGRESS_EVERY = 1_000_000;

export function stepParticles(p: PreparedScenario, a: ParticleArrays, rng: Xoshiro128, onProgress?: StepProgress): Tallies {
  const k = new Kernel(p, a, rng);
  const zone = p.zone;
  for (let i = 0; i < a.count; i++) {
    // Products, not **: the result must not depend on an engine's pow.
    const dx = a.x[i] - zone.x_m;
    const dy = a.y[i] - zone.y_m;
    const dz = a.z[i] - zone.z_m;
    const r2 = dx * dx + dy * dy + dz * dz;
    a.level[i] = tierAt(p.varianceReduction, r2);
  }
  let nextReport = PROGRESS_EVERY;
  while (k.live > 0) {
    // Copies that reweight() adds join the live block's end and walk in the same pass; a particle
    // that roulette removes leaves another live one in its row.
    for (let i = 0; i < k.live;) {
      const f = walk(k, i);
      if (f === -1) i++;
      else if (f === REWEIGHT) reweight(k, i);
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
    copies: k.copies,
    rouletteRemoved: k.rouletteKilled,
  };
}

// Released particles only: a split copy's work is part of its source particle's.
function progressFraction(a: ParticleArrays, live: number, duration: number): number {
  let done = a.count;
  for (let i = 0; i < live; i++) {
    if (a.child[i]) continue;
    done--;
    const end = Math.min(duration, a.exhaustAt[i]);
    done += end > a.release[i] ? (a.t[i] - a.release[i]) / (end - a.release[i]) : 1;
  }
  return done / a.count;
}

// Put final states back in release order so callers can line them up with particle ids. Done in
// place, cycle by cycle, with one byte per particle: copies of the columns cost a million-particle
// batch some 36 MB at its peak. Rows 0…count−1 hold the released particles once the walk is over.
function restoreOrder(a: ParticleArrays, ids: Int32Array): void {
  const { x, y, z, t, bin } = a;
  const placed = new Uint8Array(a.count);
  for (let start = 0; start < a.count; start++) {
    if (placed[start]) continue;
    placed[start] = 1;
    let cx = x[start],
      cy = y[start],
      cz = z[start],
      ct = t[start],
      cb = bin[start];
    // The state carried came from a row whose id is `to`: it belongs there.
    let to = ids[start];
    while (to !== start) {
      const nx = x[to],
        ny = y[to],
        nz = z[to],
        nt = t[to],
        nb = bin[to];
      x[to] = cx;
      y[to] = cy;
      z[to] = cz;
      t[to] = ct;
      bin[to] = cb;
      cx = nx;
      cy = ny;
      cz = nz;
      ct = nt;
      cb = nb;
      placed[to] = 1;
      to = ids[to];
    }
    x[start] = cx;
    y[start] = cy;
    z[start] = cz;
    t[start] = ct;
    bin[start] = cb;
  }
}
