import * as det from '../det-math/index';
import { JET_DECAY_CONSTANT, JET_SPREADING_RATE, LN2, jetCentrelineSpeed, jetFrame, jetHalfWidth, type RoundJet } from './round-jet';

// Local copies of the deterministic functions this hot path calls (a module runner may read imports through getters).
const exp = det.exp;

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

const FRAME = new Float64Array(6);

// Writes the jet's eddy diffusivity into out[0] and its gradient ∇D into out[1..3] (the walk's drift
// term); the same geometry and fade as jetEddyDiffusivity. Allocation-free, for the step loop.
export function jetDiffusivityAndGradient(jet: RoundJet, px_m: number, py_m: number, pz_m: number, out: Float64Array): void {
  const x = jetFrame(jet, px_m, py_m, pz_m, FRAME);
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
  const g = exp(-LN2 * rr * inverseSquare);
  const d = scale * g;
  const axial = scaleSlope * g + d * 2 * LN2 * rr * inverseSquare * (halfWidthSlope / halfWidth);
  const radial = -2 * LN2 * inverseSquare * d;
  out[0] = d;
  out[1] = axial * jet.ex + radial * FRAME[0];
  out[2] = axial * jet.ey + radial * FRAME[1];
  out[3] = axial * jet.ez + radial * FRAME[2];
}
