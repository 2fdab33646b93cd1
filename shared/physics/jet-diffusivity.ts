import { scratchFloat64 } from '../det-math/scratch';
import * as det from '../det-math/index';
import { JET_DECAY_CONSTANT, JET_SPREADING_RATE, LN2, jetCentrelineSpeed, jetFrameAt, jetHalfWidth, type RoundJet } from './round-jet';

// Local copies of the deterministic functions this hot path calls (a module runner may read imports through getters).
const exp = det.exp;
// The step loop's array form: no double crosses a call (det-math/words.ts IO).
const expIO = det.expIO;
const IO = det.IO;

// ν_T ≈ 0.028·u_c·r½ across the self-similar round jet (Pope, Turbulent Flows, ch. 5, from memory).
export const JET_EDDY_VISCOSITY_RATIO = 0.028;

// The jet's own eddy diffusivity 0.028·u_c·r½, faded with the velocity profile so it vanishes
// outside the jet (the fade is our choice, common practice for a bounded turbulent region).
export function jetEddyDiffusivity(axial_m: number, radial_m: number, speed_mPerS: number, diameter_m: number): number {
  if (axial_m <= 0) return 0;
  const halfWidth_m = jetHalfWidth(axial_m, diameter_m);
  const eta = radial_m / halfWidth_m;
  return JET_EDDY_VISCOSITY_RATIO * jetCentrelineSpeed(axial_m, speed_mPerS, diameter_m) * halfWidth_m * exp(-LN2 * eta * eta);
}

const FRAME = scratchFloat64(7);
const AT = scratchFloat64(3);

// Writes the jet's eddy diffusivity into out[0] and its gradient ∇D into out[1..3] (the walk's drift
// term); the same geometry and fade as jetEddyDiffusivity.
export function jetDiffusivityAndGradient(jet: RoundJet, px_m: number, py_m: number, pz_m: number, out: Float64Array): void {
  AT.set([px_m, py_m, pz_m]);
  jetDiffusivityAndGradientAt(jet, AT, out);
}

/** jetDiffusivityAndGradient at the point at[0..2]: the step loop's allocation-free form. */
export function jetDiffusivityAndGradientAt(jet: RoundJet, at: Float64Array, out: Float64Array): void {
  jetFrameAt(jet, at, FRAME);
  const x = FRAME[6];
  if (x <= 0) {
    out.fill(0, 0, 4);
    return;
  }
  const rr = FRAME[3];
  const halfWidth = FRAME[4];
  const halfWidthSlope = FRAME[5];
  const { speed_mPerS } = jet;
  const core_m = JET_DECAY_CONSTANT * jet.diameter_m;
  // u_c·r½ = B·S·u₀·d₀ is constant in the far field.
  const scale =
    x >= core_m ? JET_EDDY_VISCOSITY_RATIO * speed_mPerS * core_m * JET_SPREADING_RATE : JET_EDDY_VISCOSITY_RATIO * speed_mPerS * halfWidth;
  const scaleSlope = x >= core_m ? 0 : JET_EDDY_VISCOSITY_RATIO * speed_mPerS * halfWidthSlope;
  const inverseSquare = 1 / (halfWidth * halfWidth);
  IO[0] = -LN2 * rr * inverseSquare;
  expIO();
  const g = IO[0];
  const d = scale * g;
  const axial = scaleSlope * g + d * 2 * LN2 * rr * inverseSquare * (halfWidthSlope / halfWidth);
  const radial = -2 * LN2 * inverseSquare * d;
  out[0] = d;
  out[1] = axial * jet.ex + radial * FRAME[0];
  out[2] = axial * jet.ey + radial * FRAME[1];
  out[3] = axial * jet.ez + radial * FRAME[2];
}
