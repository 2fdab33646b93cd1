import { scratchFloat64 } from '../../shared/det-math/scratch';
import type { RoundJet } from '../../shared/physics/round-jet';
import { FATES } from '../../shared/vocabulary/fractions';
import { GRAVITY_MPerS2 } from '../../shared/physics/constants';
import type { ParticleArrays } from './release';
import type { Xoshiro128 } from './rng';
import { stepRule } from './step-rule';
import type { PreparedScenario } from './types';
import { dropChildRow, swapRows } from './importance';

export const NORMAL_BLOCK = 3 * 2048;

/**
 * Where each of the walk's numeric settings sits in Kernel.scalars. They live in a Float64Array,
 * not in fields, so every load is a double whatever the scenario: a whole-number setting (a 3 m
 * room, a worker at y = 2) read from a field is a small integer, and code the JIT compiled on one
 * scenario's integers stops and recompiles when the next scenario brings fractions.
 */
export const SCALAR = {
  draftX: 0,
  draftY: 1,
  zoneFloor: 2,
  hoodFloor: 3,
  cx: 4,
  cy: 5,
  cz: 6,
  maxStep: 7,
  minStep: 8,
  stepFraction: 9,
  driftFraction: 10,
  midpointLimit: 11,
  invBin: 12,
  L: 13,
  W: 14,
  H: 15,
  wrapX: 16,
  wrapY: 17,
  R: 18,
  duration: 19,
  roomDiffusivity: 20,
  lagrangianTime: 21,
  jet: 22,
  wallDeposition: 23,
  reduce: 24,
  nearFace: 25,
  leaveFace: 26,
  pecletIn: 27,
  pecletOut: 28,
  deepFactor: 29,
} as const;
const SCALAR_COUNT = 30;
// Steps whose hood drift uses under a fifth of the drift limit keep Euler: their lag is negligible.
const MIDPOINT_SHARE = 0.2;

/** Everything one walk needs, in one fixed-shape object so V8 keeps its loads monomorphic. */
export class Kernel {
  readonly normals = new Float64Array(NORMAL_BLOCK);
  readonly field = scratchFloat64(8);
  /** The air's drift at a point, the step rule's length scales and the jet's diffusivity there (walk-air.ts airAt). */
  readonly air = scratchFloat64(7);
  /** The point airAt evaluates, and a step's segment for the hood faces (hood-field.ts): arrays, not arguments. */
  readonly at = scratchFloat64(3);
  readonly seg = scratchFloat64(6);
  readonly settling: Float64Array;
  /** Relaxation time τ = V_TS/g per bin; bins with τ above the shortest step carry a velocity. */
  readonly relaxation: Float64Array;
  /** Brownian diffusivity per bin; the room's eddy diffusivity grows with age on top (SCALAR.roomDiffusivity). */
  readonly brownian: Float64Array;
  /** Deposition velocity on walls, the extra on the floor beyond settling, and on the ceiling (Lai & Nazaroff), per bin. */
  readonly wallVelocity: Float64Array;
  readonly floorExtraVelocity: Float64Array;
  readonly ceilingVelocity: Float64Array;
  readonly jet: RoundJet;
  readonly zoneResidence_s: Float64Array;
  /** 1 for a particle (by release id) that spent any time in the breathing zone: its history counts towards the verdict. */
  readonly zoneVisited: Uint8Array;
  readonly trajectories: Float32Array;
  readonly nextFrame: Int32Array;
  readonly hoods: Float64Array;
  readonly hoodCount: number;
  /** The walk's numeric settings, at the indices of SCALAR. */
  readonly scalars = new Float64Array(SCALAR_COUNT);
  readonly lastBin: number;
  readonly nBins: number;
  readonly frames: number;
  readonly frameInterval_s: number;
  readonly ids: Int32Array;
  readonly fate: Int8Array;
  readonly fateMass_mg = new Float64Array(FATES.length);
  readonly deposition_mg: Float64Array;
  readonly particleMass_mg: Float64Array;
  readonly depositionNx: number;
  readonly depositionNy: number;
  /** Variance reduction's importance map (workers/engine/importance.ts), per tier. */
  readonly inward2: Float64Array;
  readonly outward2: Float64Array;
  readonly target: Float64Array;
  readonly exhaustRate_perS: number;
  readonly wrappedWallRate_perS: Float64Array;
  normalIndex = NORMAL_BLOCK;
  steps = 0;
  /** Rows 0…live−1 walk; rows live…rows−1 hold released particles that have ended. */
  live: number;
  rows: number;
  /** The target weight the walk left for reweight(). */
  pendingTarget = 1;
  copies = 0;
  rouletteKilled = 0;

  constructor(
    p: PreparedScenario,
    readonly a: ParticleArrays,
    readonly rng: Xoshiro128,
  ) {
    const rule = stepRule(p);
    this.settling = p.bins.settling_mPerS;
    // The drag-corrected terminal speed is g·τ, so τ = V_TS/g keeps the two consistent (Hinds Eq. 3.20).
    this.relaxation = p.bins.settling_mPerS.map((v) => v / GRAVITY_MPerS2);
    this.brownian = p.bins.brownianDiffusivity_m2PerS;
    this.wallVelocity = p.surfaces.wall_mPerS;
    this.floorExtraVelocity = p.surfaces.floorExtra_mPerS;
    this.ceilingVelocity = p.surfaces.ceiling_mPerS;
    this.jet = p.jet ?? NO_JET;
    this.nBins = p.bins.count;
    this.zoneResidence_s = new Float64Array(p.timeBins * p.bins.count);
    this.frames = p.trajectory.frames;
    this.frameInterval_s = p.trajectory.frameInterval_s;
    this.trajectories = new Float32Array(p.trajectory.particles * p.trajectory.frames * 3).fill(NaN);
    this.nextFrame = new Int32Array(p.trajectory.particles);
    this.hoods = p.hoods.params;
    this.hoodCount = p.hoods.count;
    const [draftX, draftY] = p.draft_mPerS;
    const s = this.scalars;
    s[SCALAR.draftX] = draftX;
    s[SCALAR.draftY] = draftY;
    s[SCALAR.zoneFloor] = rule.zoneFloor_m;
    s[SCALAR.hoodFloor] = rule.hoodFloor_m;
    s[SCALAR.cx] = p.zone.x_m;
    s[SCALAR.cy] = p.zone.y_m;
    s[SCALAR.cz] = p.zone.z_m;
    s[SCALAR.maxStep] = rule.maxStep_s;
    s[SCALAR.minStep] = rule.minStep_s;
    s[SCALAR.stepFraction] = p.stepFraction;
    s[SCALAR.driftFraction] = rule.driftFraction;
    s[SCALAR.midpointLimit] = MIDPOINT_SHARE * rule.driftFraction;
    s[SCALAR.invBin] = 1 / p.timeBin_s;
    s[SCALAR.L] = p.room.length_m;
    s[SCALAR.W] = p.room.width_m;
    s[SCALAR.H] = p.room.height_m;
    // A uniform draft in a closed box must return somewhere; letting it recirculate (periodic
    // side walls along its components) keeps the field divergence-free instead of piling dust
    // against the downwind wall.
    s[SCALAR.wrapX] = Math.abs(draftX) > 1e-9 ? 1 : 0;
    s[SCALAR.wrapY] = Math.abs(draftY) > 1e-9 ? 1 : 0;
    s[SCALAR.R] = p.zone.radius_m;
    s[SCALAR.duration] = p.duration_s;
    s[SCALAR.roomDiffusivity] = p.eddyDiffusivity_m2PerS;
    s[SCALAR.lagrangianTime] = p.lagrangianTime_s;
    s[SCALAR.jet] = p.jet ? 1 : 0;
    s[SCALAR.wallDeposition] = p.surfaces.enabled ? 1 : 0;
    const plan = p.varianceReduction;
    // Final states per particle (keepParticles) only mean something for the plain walk.
    s[SCALAR.reduce] = plan.enabled && !p.keepParticles ? 1 : 0;
    s[SCALAR.nearFace] = plan.nearFace_m;
    s[SCALAR.leaveFace] = plan.leaveFace_m;
    s[SCALAR.pecletIn] = plan.pecletIn;
    s[SCALAR.pecletOut] = plan.pecletOut;
    s[SCALAR.deepFactor] = plan.deepFactor;
    this.inward2 = plan.inward2;
    this.outward2 = plan.outward2;
    this.target = plan.target;
    this.exhaustRate_perS = p.exhaustRate_perS;
    this.wrappedWallRate_perS = p.surfaces.wrappedWallRate_perS;
    this.lastBin = p.timeBins - 1;
    this.ids = Int32Array.from({ length: a.capacity }, (_, i) => i);
    this.fate = new Int8Array(a.count).fill(-1);
    this.zoneVisited = new Uint8Array(a.count);
    this.depositionNx = p.deposition.nx;
    this.depositionNy = p.deposition.ny;
    this.deposition_mg = new Float64Array(p.deposition.nx * p.deposition.ny);
    this.particleMass_mg = p.bins.particleMass_mg;
    this.live = a.count;
    this.rows = a.count;
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

// A jet of zero speed keeps the kernel's shape the same with and without one.
const NO_JET: RoundJet = { ox_m: 0, oy_m: 0, oz_m: 0, ex: 0, ey: 0, ez: 1, speed_mPerS: 0, diameter_m: 1 };

/**
 * Tallies particle i's fate (its mass times its weight) and keeps live particles packed at the
 * front: it swaps with the last live one, so its final state ends up behind the live block and no
 * pass visits it again. A split copy's row is dropped instead.
 */
export function retire(k: Kernel, i: number, f: number): void {
  const a = k.a;
  const mass = k.particleMass_mg[a.bin[i]] * a.w[i];
  k.fateMass_mg[f] += mass;
  if (f === 1) {
    const ix = Math.min(k.depositionNx - 1, Math.floor((a.x[i] / k.scalars[SCALAR.L]) * k.depositionNx));
    const iy = Math.min(k.depositionNy - 1, Math.floor((a.y[i] / k.scalars[SCALAR.W]) * k.depositionNy));
    k.deposition_mg[ix * k.depositionNy + iy] += mass;
  }
  const last = --k.live;
  if (!a.child[i]) k.fate[k.ids[i]] = f;
  swapRows(k, i, last);
  if (a.child[last]) dropChildRow(k, last);
}
