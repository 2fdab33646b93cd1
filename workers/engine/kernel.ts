import { HOOD_STRIDE } from './hood-field.ts';
import type { ParticleArrays } from './release.ts';
import type { Xoshiro128 } from './rng.ts';
import { stepRule } from './step-rule.ts';
import type { PreparedScenario } from './types.ts';

export const NORMAL_BLOCK = 3 * 2048;
// Steps whose hood drift uses under a fifth of the drift limit keep Euler: their lag is negligible.
const MIDPOINT_SHARE = 0.2;

/** Everything one walk needs, in one fixed-shape object so V8 keeps its loads monomorphic. */
export class Kernel {
  readonly normals = new Float64Array(NORMAL_BLOCK);
  readonly field = new Float64Array(6);
  readonly settling: Float64Array;
  readonly sqrt2D: Float64Array;
  readonly diffusionFactor: Float64Array;
  /** √(2D·diffusionFactor): the random step's spread per metre of feature distance on a diffusion-bound step (f/3; 0 without diffusion). */
  readonly sigmaPerNear: Float64Array;
  /** √(2D·dt) at the longest and the shortest step. */
  readonly sigmaMax: Float64Array;
  readonly sigmaMin: Float64Array;
  readonly zoneResidence_s: Float64Array;
  readonly trajectories: Float32Array;
  readonly nextFrame: Int32Array;
  readonly hoods: Float64Array;
  readonly hoodCount: number;
  readonly driftFraction: number;
  readonly midpointLimit: number;
  /** Hood 0 unpacked (see packHoods), so the common single-hood case runs on locals. */
  readonly h0: Hood0;
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
  readonly ids: Int32Array;
  readonly fate: Int8Array;
  readonly fateMass_mg = new Float64Array(4);
  readonly deposition_mg: Float64Array;
  readonly particleMass_mg: Float64Array;
  readonly depositionNx: number;
  readonly depositionNy: number;
  normalIndex = NORMAL_BLOCK;
  steps = 0;
  live: number;

  constructor(p: PreparedScenario, readonly a: ParticleArrays, readonly rng: Xoshiro128) {
    const rule = stepRule(p);
    this.settling = p.bins.settling_mPerS;
    this.sqrt2D = p.bins.diffusivity_m2PerS.map((d) => Math.sqrt(2 * d));
    this.diffusionFactor = rule.diffusionFactor;
    this.sigmaPerNear = this.sqrt2D.map((s, b) => (s > 0 ? s * Math.sqrt(rule.diffusionFactor[b]) : 0));
    this.sigmaMax = this.sqrt2D.map((s) => s * Math.sqrt(rule.maxStep_s));
    this.sigmaMin = this.sqrt2D.map((s) => s * Math.sqrt(rule.minStep_s));
    this.nBins = p.bins.count;
    this.zoneResidence_s = new Float64Array(p.timeBins * p.bins.count);
    this.frames = p.trajectory.frames;
    this.frameInterval_s = p.trajectory.frameInterval_s;
    this.trajectories = new Float32Array(p.trajectory.particles * p.trajectory.frames * 3).fill(NaN);
    this.nextFrame = new Int32Array(p.trajectory.particles);
    this.hoods = p.hoods.params;
    this.hoodCount = p.hoods.count;
    this.driftFraction = rule.driftFraction;
    this.midpointLimit = MIDPOINT_SHARE * rule.driftFraction;
    this.h0 = unpackHood(p.hoods.params, p.hoods.count);
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
    this.ids = Int32Array.from({ length: a.count }, (_, i) => i);
    this.fate = new Int8Array(a.count).fill(-1);
    this.depositionNx = p.deposition.nx;
    this.depositionNy = p.deposition.ny;
    this.deposition_mg = new Float64Array(p.deposition.nx * p.deposition.ny);
    this.particleMass_mg = p.bins.particleMass_mg;
    this.live = a.count;
    // Frames before a particle exists stay NaN: its first frame is the first one at or after release.
    for (let i = 0; i < a.count; i++) {
      const sl = a.slot[i];
      if (sl < 0) continue;
      let f = Math.ceil(a.release[i] / this.frameInterval_s);
      if (f > 0 && (f - 1) * this.frameInterval_s >= a.release[i]) f--;
      this.nextFrame[sl] = f;
    }
  }
}

function swap(arr: Float64Array | Int32Array, i: number, j: number): void {
  const v = arr[i];
  arr[i] = arr[j];
  arr[j] = v;
}

/**
 * Tallies particle i's fate and keeps live particles packed at the front: it swaps with the last
 * live one, so its final state ends up behind the live block and no pass visits it again.
 */
export function retire(k: Kernel, i: number, f: number): void {
  const a = k.a;
  const mass = k.particleMass_mg[a.bin[i]];
  k.fateMass_mg[f] += mass;
  if (f === 1) {
    const ix = Math.min(k.depositionNx - 1, Math.floor((a.x[i] / k.L) * k.depositionNx));
    const iy = Math.min(k.depositionNy - 1, Math.floor((a.y[i] / k.W) * k.depositionNy));
    k.deposition_mg[ix * k.depositionNy + iy] += mass;
  }
  k.fate[k.ids[i]] = f;
  const last = --k.live;
  swap(a.x, i, last);
  swap(a.y, i, last);
  swap(a.z, i, last);
  swap(a.t, i, last);
  swap(a.release, i, last);
  swap(a.exhaustAt, i, last);
  swap(a.bin, i, last);
  swap(a.slot, i, last);
  swap(k.ids, i, last);
}

export interface Hood0 {
  x: number; y: number; z: number;
  nx: number; ny: number; nz: number;
  e1x: number; e1y: number; e1z: number;
  e2x: number; e2y: number; e2z: number;
  halfWidth: number; halfHeight: number;
  airflow: number; area: number; coefficient: number; slotCoefficient: number; faceVelocity: number;
  reach: number; boothDepth: number;
  slot: boolean; flanged: boolean; booth: boolean;
}

function unpackHood(p: Float64Array, count: number): Hood0 {
  const v = count > 0 ? p.subarray(0, HOOD_STRIDE) : new Float64Array(HOOD_STRIDE);
  const kind = v[0];
  return {
    x: v[1], y: v[2], z: v[3], nx: v[4], ny: v[5], nz: v[6], e1x: v[7], e1y: v[8], e1z: v[9], e2x: v[10], e2y: v[11], e2z: v[12],
    halfWidth: v[13], halfHeight: v[14], airflow: v[15], area: v[16], coefficient: v[17], slotCoefficient: v[17] * v[19], faceVelocity: v[18],
    reach: v[20], boothDepth: v[21],
    slot: kind === 2 || kind === 3, flanged: kind === 1 || kind === 3 || kind === 4, booth: kind === 4,
  };
}

