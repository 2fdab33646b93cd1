import { type AirProperties, STANDARD_AIR } from './air';
import { BOLTZMANN_J_PER_K } from './constants';
import { slipCorrection } from './slip';
import { requireNonNegative, requirePositive } from './validate';

// Stokes–Einstein with slip, D = k·T·Cc/(3π·μ·d) (Hinds Eq. 7.7).
export function diffusionCoefficient(diameter_m: number, air: AirProperties = STANDARD_AIR): number {
  requirePositive('diameter_m', diameter_m);
  return (BOLTZMANN_J_PER_K * air.temperature_K * slipCorrection(diameter_m, air)) / (3 * Math.PI * air.viscosity_PaS * diameter_m);
}

// One-axis rms displacement x_rms = √(2Dt) (Hinds Eq. 7.18).
export function rmsDisplacement(diffusivity_m2PerS: number, time_s: number): number {
  requireNonNegative('diffusivity_m2PerS', diffusivity_m2PerS);
  requireNonNegative('time_s', time_s);
  return Math.sqrt(2 * diffusivity_m2PerS * time_s);
}
