import { pow } from '../det-math/index';
import { type AirProperties, STANDARD_AIR } from './air';
import { GRAVITY_MPerS2 } from './constants';
import { bisect } from './root';
import { particleReynolds } from './reynolds';
import { slipCorrection } from './slip';
import { requirePositive } from './validate';

// Particle relaxation time τ = ρ_p·d²·Cc/(18μ) (Hinds Eq. 5.3).
export function relaxationTime(diameter_m: number, density_kgPerM3: number, air: AirProperties = STANDARD_AIR): number {
  requirePositive('diameter_m', diameter_m);
  requirePositive('density_kgPerM3', density_kgPerM3);
  return (density_kgPerM3 * diameter_m * diameter_m * slipCorrection(diameter_m, air)) / (18 * air.viscosity_PaS);
}

// Stokes settling with slip, V = ρ_p·d²·g·Cc/(18μ) (Hinds Eq. 3.21).
export function stokesSettlingVelocity(diameter_m: number, density_kgPerM3: number, air: AirProperties = STANDARD_AIR): number {
  return relaxationTime(diameter_m, density_kgPerM3, air) * GRAVITY_MPerS2;
}

// Drag relative to Stokes: Schiller & Naumann 1933 below Re 1000, Newton's C_D = 0.44 above.
export function dragFactor(reynolds: number): number {
  return reynolds < 1000 ? 1 + 0.15 * pow(reynolds, 0.687) : (0.44 * reynolds) / 24;
}

// Force balance V·f(Re) = V_Stokes solved by bisection on [0, V_Stokes]; f ≥ 1 keeps the root inside.
export function settlingVelocity(diameter_m: number, density_kgPerM3: number, air: AirProperties = STANDARD_AIR): number {
  const stokes_mPerS = stokesSettlingVelocity(diameter_m, density_kgPerM3, air);
  const residual = (velocity_mPerS: number) =>
    velocity_mPerS * dragFactor(particleReynolds(diameter_m, velocity_mPerS, air)) - stokes_mPerS;
  return bisect(residual, 0, stokes_mPerS);
}
