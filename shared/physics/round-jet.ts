import { scratchFloat64 } from '../det-math/scratch';
import * as det from '../det-math/index';

// Local copies of the deterministic functions this hot path calls (a module runner may read imports through getters).
// In its array form: no double crosses a call (det-math/words.ts IO).
const expIO = det.expIO;
const IO = det.IO;

// Turbulent round free jet (Pope, Turbulent Flows, ch. 5, from memory): far field
// u_c = B·u₀·d₀/x, u/u_c = exp(−ln2·(r/r½)²), r½ = S·x, with Panchapakesan & Lumley's (1993)
// B = 6.06 and S = 0.096, whose volume flux 4·B·S²/ln2·x/d₀ = 0.32·x/d₀ matches Ricou & Spalding.
// Virtual origin at the nozzle. The potential core (x < B·d₀) keeps u_c = u₀ while r½ widens
// linearly from the nozzle's flux-matched (d₀/2)·√ln2 to S·B·d₀, so u_c and r½ are continuous.
// The radial velocity follows from continuity, ∂u/∂x + (1/r)·∂(r·v)/∂r = 0, for that profile:
// v = −(u_c·r½²)'·(1 − g)/(2·ln2·r) + u_c·g·r·r½'/r½ with g = exp(−ln2·(r/r½)²).
export const JET_DECAY_CONSTANT = 6.06;
export const JET_SPREADING_RATE = 0.096;

export const LN2 = Math.LN2;
export const NOZZLE_HALF_WIDTH_PER_DIAMETER = 0.5 * Math.sqrt(LN2);

export function jetCentrelineSpeed(axial_m: number, speed_mPerS: number, diameter_m: number): number {
  if (axial_m <= 0) return 0;
  return speed_mPerS * Math.min(1, (JET_DECAY_CONSTANT * diameter_m) / axial_m);
}

export function jetHalfWidth(axial_m: number, diameter_m: number): number {
  const core_m = JET_DECAY_CONSTANT * diameter_m;
  if (axial_m >= core_m) return JET_SPREADING_RATE * axial_m;
  const nozzle_m = NOZZLE_HALF_WIDTH_PER_DIAMETER * diameter_m;
  return nozzle_m + ((JET_SPREADING_RATE * core_m - nozzle_m) * Math.max(0, axial_m)) / core_m;
}

// Q(x) = ∫u·2πr dr = π·u_c·r½²/ln2 for the Gaussian profile.
export function jetVolumeFlux(axial_m: number, speed_mPerS: number, diameter_m: number): number {
  const halfWidth_m = jetHalfWidth(axial_m, diameter_m);
  return (Math.PI * jetCentrelineSpeed(axial_m, speed_mPerS, diameter_m) * halfWidth_m * halfWidth_m) / LN2;
}

// A jet leaving a nozzle of diameter d₀ at speed u₀ from origin o along the unit vector e.
export interface RoundJet {
  readonly ox_m: number;
  readonly oy_m: number;
  readonly oz_m: number;
  readonly ex: number;
  readonly ey: number;
  readonly ez: number;
  readonly speed_mPerS: number;
  readonly diameter_m: number;
}

// Puts point at[0..2] in the jet's frame and leaves its axial distance in frame[6] (≤ 0 behind the nozzle plane,
// where the rest of frame is left alone). frame gets the radial vector from the axis [0..2], its square length [3],
// r½ [4] and dr½/dx [5]. Allocation-free, for the step-loop field functions that share this geometry: the point
// comes in an array, since a double crossing a call V8 has not inlined is a heap allocation.
export function jetFrameAt(jet: RoundJet, at: Float64Array, frame: Float64Array): void {
  const { ex, ey, ez } = jet;
  const dx = at[0] - jet.ox_m;
  const dy = at[1] - jet.oy_m;
  const dz = at[2] - jet.oz_m;
  const x = dx * ex + dy * ey + dz * ez;
  frame[6] = x;
  if (x <= 0) return;
  const rx = dx - x * ex;
  const ry = dy - x * ey;
  const rz = dz - x * ez;
  frame[0] = rx;
  frame[1] = ry;
  frame[2] = rz;
  frame[3] = rx * rx + ry * ry + rz * rz;
  const core_m = JET_DECAY_CONSTANT * jet.diameter_m;
  if (x >= core_m) {
    frame[4] = JET_SPREADING_RATE * x;
    frame[5] = JET_SPREADING_RATE;
  } else {
    const nozzle_m = NOZZLE_HALF_WIDTH_PER_DIAMETER * jet.diameter_m;
    const halfWidthSlope = (JET_SPREADING_RATE * core_m - nozzle_m) / core_m;
    frame[4] = nozzle_m + halfWidthSlope * x;
    frame[5] = halfWidthSlope;
  }
}

const FRAME = scratchFloat64(7);
const AT = scratchFloat64(3);

// Writes the jet's air velocity (m/s) at point p into out[0..2]; zero behind the nozzle plane.
export function jetVelocity(jet: RoundJet, px_m: number, py_m: number, pz_m: number, out: Float64Array): void {
  AT.set([px_m, py_m, pz_m]);
  jetVelocityAt(jet, AT, out);
}

/** jetVelocity at the point at[0..2]: the step loop's allocation-free form. */
export function jetVelocityAt(jet: RoundJet, at: Float64Array, out: Float64Array): void {
  jetFrameAt(jet, at, FRAME);
  const x = FRAME[6];
  if (x <= 0) {
    out.fill(0, 0, 3);
    return;
  }
  const r = Math.sqrt(FRAME[3]);
  const halfWidth = FRAME[4];
  const halfWidthSlope = FRAME[5];
  const { speed_mPerS } = jet;
  const core_m = JET_DECAY_CONSTANT * jet.diameter_m;
  const uc = x >= core_m ? (speed_mPerS * core_m) / x : speed_mPerS;
  const fluxSlope = x >= core_m ? (uc * halfWidth * halfWidth) / x : 2 * uc * halfWidth * halfWidthSlope;
  const eta = r / halfWidth;
  IO[0] = -LN2 * eta * eta;
  expIO();
  const g = IO[0];
  const u = uc * g;
  // (1 − g)/r → 0 on the axis, where the radial direction is undefined anyway.
  const v = r > 1e-12 * halfWidth ? (-fluxSlope * (1 - g)) / (2 * LN2 * r) + (uc * g * r * halfWidthSlope) / halfWidth : 0;
  const radial = r > 1e-12 * halfWidth ? v / r : 0;
  out[0] = u * jet.ex + radial * FRAME[0];
  out[1] = u * jet.ey + radial * FRAME[1];
  out[2] = u * jet.ez + radial * FRAME[2];
}
