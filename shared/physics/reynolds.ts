import { type AirProperties, STANDARD_AIR } from './air';
import { requireFinite, requirePositive } from './validate';

// Particle Reynolds number Re = ρ_a·V·d/μ (Hinds Eq. 2.41).
export function particleReynolds(diameter_m: number, velocity_mPerS: number, air: AirProperties = STANDARD_AIR): number {
  requirePositive('diameter_m', diameter_m);
  requireFinite('velocity_mPerS', velocity_mPerS);
  return (air.density_kgPerM3 * Math.abs(velocity_mPerS) * diameter_m) / air.viscosity_PaS;
}
