import { type AirProperties, STANDARD_AIR } from './air';
import { UNIT_DENSITY_kgPerM3 } from './constants';
import { solveIncreasingPositive } from './root';
import { slipCorrection } from './slip';
import { requirePositive } from './validate';

// Both sides of Hinds Eq. 3.26 are d²·ρ·Cc(d); d²·Cc(d) increases with d, so one root exists.
function settlingGroup(diameter_m: number, density_kgPerM3: number, air: AirProperties): number {
  return diameter_m ** 2 * density_kgPerM3 * slipCorrection(diameter_m, air);
}

// d_a²·ρ₀·Cc(d_a) = d_p²·(ρ_p/χ)·Cc(d_p) (Hinds Eq. 3.26 form), slip kept on both sides.
export function aerodynamicDiameter(
  diameter_m: number,
  density_kgPerM3: number,
  shapeFactor = 1,
  air: AirProperties = STANDARD_AIR,
): number {
  requirePositive('diameter_m', diameter_m);
  requirePositive('density_kgPerM3', density_kgPerM3);
  requirePositive('shapeFactor', shapeFactor);
  const target = settlingGroup(diameter_m, density_kgPerM3 / shapeFactor, air);
  const guess = diameter_m * Math.sqrt(density_kgPerM3 / (shapeFactor * UNIT_DENSITY_kgPerM3));
  return solveIncreasingPositive((d) => settlingGroup(d, UNIT_DENSITY_kgPerM3, air) - target, guess);
}

// Inverse of Hinds Eq. 3.26 form: the physical diameter that settles like the given aerodynamic one.
export function physicalDiameter(
  aerodynamicDiameter_m: number,
  density_kgPerM3: number,
  shapeFactor = 1,
  air: AirProperties = STANDARD_AIR,
): number {
  requirePositive('aerodynamicDiameter_m', aerodynamicDiameter_m);
  requirePositive('density_kgPerM3', density_kgPerM3);
  requirePositive('shapeFactor', shapeFactor);
  const target = settlingGroup(aerodynamicDiameter_m, UNIT_DENSITY_kgPerM3, air);
  const guess = aerodynamicDiameter_m * Math.sqrt((shapeFactor * UNIT_DENSITY_kgPerM3) / density_kgPerM3);
  return solveIncreasingPositive((d) => settlingGroup(d, density_kgPerM3 / shapeFactor, air) - target, guess);
}
