import { atan, exp, expm1, log, pow } from '../det-math/index';
import { type AirProperties, STANDARD_AIR } from './air';
import { diffusionCoefficient } from './diffusion';
import { settlingVelocity } from './settling';
import { requirePositive } from './validate';

export interface DepositionVelocities {
  vertical_mPerS: number;
  upward_mPerS: number;
  downward_mPerS: number;
  settling_mPerS: number;
  integral: number;
}

// Near-wall eddy diffusivity ν_t/ν = 7.669e-4·y⁺³ (y⁺ < 4.3), 1.00e-3·y⁺^2.8214 (4.3–12.5),
// 1.07e-2·y⁺^1.8895 (12.5–30) (Lai & Nazaroff 2000, after Corner & Pendlebury; last two [M]).
function eddyRatio(yPlus: number): number {
  if (yPlus < 4.3) return 7.669e-4 * yPlus * yPlus * yPlus;
  if (yPlus < 12.5) return 1.0e-3 * pow(yPlus, 2.8214);
  return 1.07e-2 * pow(yPlus, 1.8895);
}

// ∫ dy⁺/(1/Sc + ν_t/ν) from 4.3 (or r⁺ beyond it) to 30, Simpson in ln y⁺. The paper replaces this
// part by the constant 39, which neglects Brownian diffusion there; keeping it matters below ~10 nm.
function outerIntegral(inverseSchmidt: number, from: number): number {
  if (from >= 30) return 0;
  const lo = log(from);
  const n = 400;
  const h = (log(30) - lo) / n;
  let sum = 0;
  for (let i = 0; i <= n; i++) {
    const y = exp(lo + i * h);
    const w = i === 0 || i === n ? 1 : i % 2 === 1 ? 4 : 2;
    sum += (w * y) / (inverseSchmidt + eddyRatio(y));
  }
  return (sum * h) / 3;
}

// Closed form of ∫ dy⁺/(1/Sc + 7.669e-4·y⁺³) from r⁺ to 4.3: 3.64·Sc^(2/3)·(a − b) (Lai & Nazaroff 2000).
function innerIntegral(schmidt: number, rPlus: number): number {
  if (rPlus >= 4.3) return 0;
  const c = 10.92 * pow(schmidt, -1 / 3);
  const part = (y: number) =>
    0.5 * log(((c + y) * (c + y) * (c + y)) / (1 / schmidt + 7.669e-4 * y * y * y)) + Math.sqrt(3) * atan((2 * y - c) / (Math.sqrt(3) * c));
  return 3.64 * pow(schmidt, 2 / 3) * (part(4.3) - part(rPlus));
}

// I = ∫ dy⁺/(1/Sc + ν_t/ν) from r⁺ = d·u*/(2ν) to 30 (Lai & Nazaroff, J. Aerosol Sci. 31:463, 2000).
export function depositionIntegral(schmidt: number, rPlus: number): number {
  requirePositive('schmidt', schmidt);
  requirePositive('rPlus', rPlus);
  return innerIntegral(schmidt, rPlus) + outerIntegral(1 / schmidt, Math.max(4.3, rPlus));
}

// v_dv = u*/I, v_du = v_s/(1 − e^(−v_s·I/u*)), v_dd = v_s/(e^(v_s·I/u*) − 1) (Lai & Nazaroff 2000);
// v_s with the drag correction, which the paper's Stokes settling omits above ~50 µm.
export function depositionVelocities(
  diameter_m: number,
  density_kgPerM3: number,
  frictionVelocity_mPerS: number,
  air: AirProperties = STANDARD_AIR,
): DepositionVelocities {
  requirePositive('diameter_m', diameter_m);
  requirePositive('density_kgPerM3', density_kgPerM3);
  const uStar = requirePositive('frictionVelocity_mPerS', frictionVelocity_mPerS);
  const kinematicViscosity_m2PerS = air.viscosity_PaS / air.density_kgPerM3;
  const schmidt = kinematicViscosity_m2PerS / diffusionCoefficient(diameter_m, air);
  const rPlus = (diameter_m * uStar) / (2 * kinematicViscosity_m2PerS);
  const integral = depositionIntegral(schmidt, rPlus);
  const settling_mPerS = settlingVelocity(diameter_m, density_kgPerM3, air);
  const vertical_mPerS = uStar / integral;
  const a = (settling_mPerS * integral) / uStar;
  // expm1 keeps both limits: a → 0 gives u*/I, a → ∞ gives v_s upward and 0 downward.
  const upward_mPerS = a < 1e-12 ? vertical_mPerS : settling_mPerS / -expm1(-a);
  const downward_mPerS = a < 1e-12 ? vertical_mPerS : settling_mPerS / expm1(a);
  return { vertical_mPerS, upward_mPerS, downward_mPerS, settling_mPerS, integral };
}
