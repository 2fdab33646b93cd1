import type { Xoshiro128 } from './rng';
import type { PreparedScenario } from './types';
import { cos, log, sin } from '../../shared/det-math/index';

export interface ParticleArrays {
  /** Particles released (source histories); rows 0…count−1 hold them once the walk is over. */
  count: number;
  /** Rows allocated: the released particles plus room for split copies (variance reduction). */
  capacity: number;
  x: Float64Array;
  y: Float64Array;
  z: Float64Array;
  t: Float64Array;
  release: Float64Array;
  exhaustAt: Float64Array;
  /** When a particle meets a wall that a draft wraps through (a loss per volume), Infinity without. */
  wallAt: Float64Array;
  /** Velocity of particles in bins that carry one (relaxation time above the shortest step); NaN until their first step. */
  ux: Float64Array;
  uy: Float64Array;
  uz: Float64Array;
  bin: Int32Array;
  slot: Int32Array;
  /** Statistical weight: 1 at release; splitting divides it, Russian roulette survivors carry the killed ones'. */
  w: Float64Array;
  /** Importance level (breathing-zone shell) and whether the particle is deep in a hood's capture region. */
  level: Int8Array;
  deep: Uint8Array;
  /** 1 for a split copy, which has no row of its own once it ends. */
  child: Uint8Array;
}

// Room for split copies alive at once beside the released particles, capped so a million-particle
// batch stays within its memory budget; when the store is full a particle simply does not split.
export function splitRoom(count: number, reduced: boolean): number {
  return reduced ? Math.min(2 * count + 256, 32_768) : 0;
}

function clamp(v: number, hi: number): number {
  return v < 0 ? 0 : v > hi ? hi : v;
}

// Release times are stratified within each bin so a small batch still covers the whole task.
// General ventilation removes particles at rate k, so each gets an exponential exhaust time at
// release: exactly the limit of a per-step removal probability k·dt, and it costs no draw per step.
// Walls that a draft wraps through (periodic sides) collect as such a loss per volume too.
export function releaseParticles(p: PreparedScenario, rng: Xoshiro128): ParticleArrays {
  const n = p.bins.particlesPerBatch.reduce((a, v) => a + v, 0);
  const c = n + splitRoom(n, p.varianceReduction.enabled && !p.keepParticles);
  const a: ParticleArrays = {
    count: n,
    capacity: c,
    x: new Float64Array(c),
    y: new Float64Array(c),
    z: new Float64Array(c),
    t: new Float64Array(c),
    release: new Float64Array(c),
    exhaustAt: new Float64Array(c),
    wallAt: new Float64Array(c).fill(Infinity),
    ux: new Float64Array(c).fill(NaN),
    uy: new Float64Array(c).fill(NaN),
    uz: new Float64Array(c).fill(NaN),
    bin: new Int32Array(c),
    slot: new Int32Array(c).fill(-1),
    w: new Float64Array(c).fill(1),
    level: new Int8Array(c),
    deep: new Uint8Array(c),
    child: new Uint8Array(c),
  };
  const { source: s, room, emission } = p;
  const events = emission.eventTimes_s;
  let i = 0;
  for (let b = 0; b < p.bins.count; b++) {
    const nb = p.bins.particlesPerBatch[b];
    // Bins without particles draw nothing, so a wider size grid does not shift the others' streams.
    if (nb === 0) continue;
    const eventOffset = Math.floor(rng.nextUniform() * Math.max(1, events.length));
    for (let j = 0; j < nb; j++, i++) {
      const t0 =
        emission.kind === 'continuous' ? ((j + rng.nextUniform()) / nb) * emission.release_s : events[(j + eventOffset) % events.length];
      let x = s.x_m;
      let y = s.y_m;
      let z = s.z_m;
      if (s.shape === 'disc') {
        const r = 0.5 * s.size_m * Math.sqrt(rng.nextUniform());
        const th = 2 * Math.PI * rng.nextUniform();
        x += r * cos(th);
        y += r * sin(th);
      } else if (s.shape === 'box') {
        x += s.size_m * (rng.nextUniform() - 0.5);
        y += s.size_m * (rng.nextUniform() - 0.5);
        z += s.size_m * (rng.nextUniform() - 0.5);
      }
      a.x[i] = clamp(x, room.length_m);
      a.y[i] = clamp(y, room.width_m);
      a.z[i] = clamp(z, room.height_m);
      a.t[i] = t0;
      a.release[i] = t0;
      a.exhaustAt[i] = p.exhaustRate_perS > 0 ? t0 - log(rng.nextUniform()) / p.exhaustRate_perS : Infinity;
      const wallRate = p.surfaces.wrappedWallRate_perS[b];
      if (wallRate > 0) a.wallAt[i] = t0 - log(rng.nextUniform()) / wallRate;
      a.bin[i] = b;
    }
  }
  pickTrajectorySample(p, a);
  return a;
}

// Spread the animated sample evenly over the particles released while frames are recorded.
function pickTrajectorySample(p: PreparedScenario, a: ParticleArrays): void {
  const window_s = (p.trajectory.frames - 1) * p.trajectory.frameInterval_s;
  const candidates: number[] = [];
  for (let i = 0; i < a.count; i++) if (a.release[i] <= window_s) candidates.push(i);
  const k = Math.min(p.trajectory.particles, candidates.length);
  for (let s = 0; s < k; s++) a.slot[candidates[Math.floor((s * candidates.length) / k)]] = s;
}
