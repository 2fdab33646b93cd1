import { JET_DECAY_CONSTANT, JET_SPREADING_RATE, LN2, NOZZLE_HALF_WIDTH_PER_DIAMETER, jetCentrelineSpeed, jetHalfWidth } from './round-jet';

// ν_T ≈ 0.028·u_c·r½ across the self-similar round jet (Pope, Turbulent Flows, ch. 5, from memory).
export const JET_EDDY_VISCOSITY_RATIO = 0.028;

// The jet's own eddy diffusivity 0.028·u_c·r½, faded with the velocity profile so it vanishes
// outside the jet (the fade is our choice, common practice for a bounded turbulent region).
export function jetEddyDiffusivity(axial_m: number, radial_m: number, speed_mPerS: number, diameter_m: number): number {
  if (axial_m <= 0) return 0;
  const halfWidth_m = jetHalfWidth(axial_m, diameter_m);
  const eta = radial_m / halfWidth_m;
  return JET_EDDY_VISCOSITY_RATIO * jetCentrelineSpeed(axial_m, speed_mPerS, diameter_m) * halfWidth_m * Math.exp(-LN2 * eta * eta);
}

// Writes the jet's eddy diffusivity into out[0] and its gradient ∇D into out[1..3] (the walk's drift
// term); the same geometry and fade as jetEddyDiffusivity. Allocation-free, for the step loop.
export function jetDiffusivityAndGradient(
  px_m: number,
  py_m: number,
  pz_m: number,
  ox_m: number,
  oy_m: number,
  oz_m: number,
  ex: number,
  ey: number,
  ez: number,
  speed_mPerS: number,
  diameter_m: number,
  out: Float64Array,
): void {
  const dx = px_m - ox_m;
  const dy = py_m - oy_m;
  const dz = pz_m - oz_m;
  const x = dx * ex + dy * ey + dz * ez;
  if (x <= 0) {
    out[0] = 0;
    out[1] = 0;
    out[2] = 0;
    out[3] = 0;
    return;
  }
  const rx = dx - x * ex;
  const ry = dy - x * ey;
  const rz = dz - x * ez;
  const rr = rx * rx + ry * ry + rz * rz;
  const core_m = JET_DECAY_CONSTANT * diameter_m;
  let scale: number;
  let scaleSlope: number;
  let halfWidth: number;
  let halfWidthSlope: number;
  if (x >= core_m) {
    // u_c·r½ = B·S·u₀·d₀ is constant in the far field.
    scale = JET_EDDY_VISCOSITY_RATIO * speed_mPerS * core_m * JET_SPREADING_RATE;
    scaleSlope = 0;
    halfWidth = JET_SPREADING_RATE * x;
    halfWidthSlope = JET_SPREADING_RATE;
  } else {
    const nozzle_m = NOZZLE_HALF_WIDTH_PER_DIAMETER * diameter_m;
    halfWidthSlope = (JET_SPREADING_RATE * core_m - nozzle_m) / core_m;
    halfWidth = nozzle_m + halfWidthSlope * x;
    scale = JET_EDDY_VISCOSITY_RATIO * speed_mPerS * halfWidth;
    scaleSlope = JET_EDDY_VISCOSITY_RATIO * speed_mPerS * halfWidthSlope;
  }
  const inverseSquare = 1 / (halfWidth * halfWidth);
  const g = Math.exp(-LN2 * rr * inverseSquare);
  const d = scale * g;
  const axial = scaleSlope * g + d * 2 * LN2 * rr * inverseSquare * (halfWidthSlope / halfWidth);
  const radial = -2 * LN2 * inverseSquare * d;
  out[0] = d;
  out[1] = axial * ex + radial * rx;
  out[2] = axial * ey + radial * ry;
  out[3] = axial * ez + radial * rz;
}
