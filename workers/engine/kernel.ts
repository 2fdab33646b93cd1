import { evaluateHoods } from './hood-field.ts';
import type { ParticleArrays } from './release.ts';
import type { Xoshiro128 } from './rng.ts';
import { stepRule } from './step-rule.ts';
import type { PreparedScenario } from './types.ts';
import { fillNormals } from './ziggurat.ts';

export const NORMAL_BLOCK = 3 * 2048;
const STEPS_PER_VISIT = 64;
// Steps whose hood drift uses under a fifth of the drift limit keep Euler: their lag is negligible.
const MIDPOINT_SHARE = 0.2;

/** Everything one walk needs, in one fixed-shape object so V8 keeps its loads monomorphic. */
export class Kernel {
  readonly normals = new Float64Array(NORMAL_BLOCK);
  readonly field = new Float64Array(6);
  readonly settling: Float64Array;
  readonly sqrt2D: Float64Array;
  readonly diffusionFactor: Float64Array;
  readonly zoneResidence_s: Float64Array;
  readonly trajectories: Float32Array;
  readonly nextFrame: Int32Array;
  readonly hoods: Float64Array;
  readonly hoodCount: number;
  readonly driftFraction: number;
  readonly stepFraction: number;
  readonly zoneFloor_m: number;
  readonly hoodFloor_m: number;
  readonly maxStep_s: number;
  readonly minStep_s: number;
  readonly L: number;
  readonly W: number;
  readonly H: number;
  readonly draftX: number;
  readonly draftY: number;
  readonly wrapX: boolean;
  readonly wrapY: boolean;
  readonly cx: number;
  readonly cy: number;
  readonly cz: number;
  readonly R: number;
  readonly duration: number;
  readonly invBin: number;
  readonly lastBin: number;
  readonly nBins: number;
  readonly frames: number;
  readonly frameInterval_s: number;
  normalIndex = NORMAL_BLOCK;
  steps = 0;

  constructor(p: PreparedScenario, readonly a: ParticleArrays, readonly rng: Xoshiro128) {
    const rule = stepRule(p);
    this.settling = p.bins.settling_mPerS;
    this.sqrt2D = p.bins.diffusivity_m2PerS.map((d) => Math.sqrt(2 * d));
    this.diffusionFactor = rule.diffusionFactor;
    this.nBins = p.bins.count;
    this.zoneResidence_s = new Float64Array(p.timeBins * p.bins.count);
    this.frames = p.trajectory.frames;
    this.frameInterval_s = p.trajectory.frameInterval_s;
    this.trajectories = new Float32Array(p.trajectory.particles * p.trajectory.frames * 3).fill(NaN);
    this.nextFrame = new Int32Array(p.trajectory.particles);
    this.hoods = p.hoods.params;
    this.hoodCount = p.hoods.count;
    this.driftFraction = rule.driftFraction;
    this.stepFraction = p.stepFraction;
    this.zoneFloor_m = rule.zoneFloor_m;
    this.hoodFloor_m = rule.hoodFloor_m;
    this.maxStep_s = rule.maxStep_s;
    this.minStep_s = rule.minStep_s;
    this.L = p.room.length_m;
    this.W = p.room.width_m;
    this.H = p.room.height_m;
    this.draftX = p.draft_mPerS[0];
    this.draftY = p.draft_mPerS[1];
    // A uniform draft in a closed box must return somewhere; letting it recirculate (periodic
    // side walls along its components) keeps the field divergence-free instead of piling dust
    // against the downwind wall.
    this.wrapX = Math.abs(this.draftX) > 1e-9;
    this.wrapY = Math.abs(this.draftY) > 1e-9;
    this.cx = p.zone.x_m;
    this.cy = p.zone.y_m;
    this.cz = p.zone.z_m;
    this.R = p.zone.radius_m;
    this.duration = p.duration_s;
    this.invBin = 1 / p.timeBin_s;
    this.lastBin = p.timeBins - 1;
  }
}

function reflect(v: number, hi: number): number {
  while (v < 0 || v > hi) v = v < 0 ? -v : 2 * hi - v;
  return v;
}

function wrap(v: number, hi: number): number {
  v %= hi;
  return v < 0 ? v + hi : v;
}

function recordFrames(k: Kernel, sl: number, t: number, x: number, y: number, z: number): void {
  while (k.nextFrame[sl] < k.frames && k.nextFrame[sl] * k.frameInterval_s <= t) {
    const o = (sl * k.frames + k.nextFrame[sl]) * 3;
    k.trajectories[o] = x;
    k.trajectories[o + 1] = y;
    k.trajectories[o + 2] = z;
    k.nextFrame[sl]++;
  }
}

/**
 * Advances particle i by up to STEPS_PER_VISIT steps; returns its fate (0 captured, 1 settled,
 * 2 exhausted, 3 airborne at the end) or −1 while it lives. Allocation-free arithmetic only.
 */
export function walk(k: Kernel, i: number): number {
  const a = k.a;
  let x = a.x[i];
  let y = a.y[i];
  let z = a.z[i];
  let t = a.t[i];
  const b = a.bin[i];
  const duration = k.duration;
  const end = a.exhaustAt[i] < duration ? a.exhaustAt[i] : duration;
  const vs = k.settling[b];
  const s2D = k.sqrt2D[b];
  const dFactor = k.diffusionFactor[b];
  const sl = a.slot[i];
  const field = k.field;
  const normals = k.normals;
  const R = k.R;
  const R2 = R * R;
  const nh = k.hoodCount;
  const hoods = k.hoods;
  const rng = k.rng;
  const residence = k.zoneResidence_s;
  const { cx, cy, cz, zoneFloor_m, hoodFloor_m, draftX, draftY, maxStep_s, minStep_s, stepFraction, driftFraction, invBin, lastBin, nBins, L, W, H, wrapX, wrapY } = k;
  let n = k.normalIndex;
  const diffusivity = 0.5 * s2D * s2D;
  let fate = -1;
  let steps = 0;
  let lastHood = -1;
  let lastHeight = 0;
  let lastDt = 0;
  while (steps < STEPS_PER_VISIT) {
    const ex = x - cx;
    const ey = y - cy;
    const ez = z - cz;
    const r2 = ex * ex + ey * ey + ez * ez;
    let d = Math.sqrt(r2) - R;
    if (d < 0) d = -d;
    if (d < zoneFloor_m) d = zoneFloor_m;
    let dh = Infinity;
    let vx = draftX;
    let vy = draftY;
    let vz = 0;
    if (nh > 0) {
      field[0] = vx;
      field[1] = vy;
      field[2] = 0;
      if (evaluateHoods(hoods, nh, x, y, z, field) >= 0) {
        fate = 0;
        break;
      }
      // Brownian bridge: a walk that starts and ends in front of a face may have touched it in
      // between, with probability exp(−a₀a₁/(D·dt)); sampling it removes the O(√dt) capture deficit.
      const hood = field[4];
      const height = field[5];
      if (hood === lastHood && height > 0 && lastHeight > 0) {
        const q = (height * lastHeight) / (diffusivity * lastDt);
        if (q < 20 && rng.nextUniform() < Math.exp(-q)) {
          fate = 0;
          break;
        }
      }
      lastHood = hood;
      lastHeight = height;
      dh = field[3] < hoodFloor_m ? hoodFloor_m : field[3];
      vx = field[0];
      vy = field[1];
      vz = field[2];
    }
    const vzs = vz - vs;
    const speed = Math.abs(vx) + Math.abs(vy) + Math.abs(vzs);
    const near = Math.min(dh, d);
    const drift = Math.min(stepFraction * d, driftFraction * dh) / speed;
    const dt0 = Math.min(dFactor * near * near, maxStep_s, drift);
    let dt = Math.max(dt0, minStep_s);
    if (t + dt > end) dt = end - t;
    const hoodShift = (Math.abs(vx - draftX) + Math.abs(vy - draftY) + Math.abs(vz)) * dt;
    if (hoodShift > MIDPOINT_SHARE * driftFraction * dh) {
      // Midpoint drift: the hood field grows toward the face, and a start-of-step velocity would
      // lag behind it (Euler), biasing capture low by a few per cent at the default step.
      field[0] = draftX;
      field[1] = draftY;
      field[2] = 0;
      if (evaluateHoods(hoods, nh, x + 0.5 * dt * vx, y + 0.5 * dt * vy, z + 0.5 * dt * vz, field) < 0) {
        vx = field[0];
        vy = field[1];
        vz = field[2];
      }
    }
    if (r2 < R2) {
      let tb = (t * invBin) | 0;
      if (tb > lastBin) tb = lastBin;
      residence[tb * nBins + b] += dt;
    }
    if (sl >= 0) recordFrames(k, sl, t, x, y, z);
    if (n === NORMAL_BLOCK) {
      fillNormals(rng, normals);
      n = 0;
    }
    lastDt = dt;
    const sigma = s2D * Math.sqrt(dt);
    x += vx * dt + sigma * normals[n];
    y += vy * dt + sigma * normals[n + 1];
    let zz = z + vz * dt + sigma * normals[n + 2];
    n += 3;
    if (x < 0 || x > L) x = wrapX ? wrap(x, L) : reflect(x, L);
    if (y < 0 || y > W) y = wrapY ? wrap(y, W) : reflect(y, W);
    if (zz < 0 || zz > H) zz = reflect(zz, H);
    // Diffusion reflects at the floor; only settling carries a particle onto it, so the
    // deposition flux is V_TS·C at the floor, as in the well-mixed settling loss V_TS/H.
    z = zz - vs * dt;
    t += dt;
    steps++;
    if (z < 0) {
      t += z / vs;
      z = 0;
      fate = 1;
      break;
    }
    if (t >= end) {
      fate = end < duration ? 2 : 3;
      break;
    }
  }
  k.normalIndex = n;
  k.steps += steps;
  a.x[i] = x;
  a.y[i] = y;
  a.z[i] = z;
  a.t[i] = t;
  return fate;
}
