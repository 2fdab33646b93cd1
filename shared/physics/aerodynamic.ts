import { type AirProperties, STANDARD_AIR } from './air';
import { UNIT_DENSITY_kgPerM3 } from './constants';
import { solveIncreasingPositive } from './root';
import { slipCorrection } from './slip';
import { requirePositive } from './validate';

// Both sides of Hinds Eq. 3.26 are d²·ρ·Cc(d); d²·Cc(d) increases with d, so one root exists.
function settlingGroup(diameter_m: number, density_kgPerM3: number, air: AirProperties): number {
  return diameter_m * diameter_m * density_kgPerM3 * slipCorrection(diameter_m, air);
}

// d_a²·ρ₀·Cc(d_a) = d_p²·(ρ_p/χ)·Cc(d_p) (Hinds Eq. 3.26 form) solved for one side given the other,
// slip kept on both, from the large-particle guess d_a ≈ d_p·√(ρ_p/(χ·ρ₀)). One solver serves both
// directions so the two cannot drift apart.
function settlingEquivalent(givenName: string, toAerodynamic: boolean) {
  return (given_m: number, density_kgPerM3: number, shapeFactor = 1, air: AirProperties = STANDARD_AIR): number => {
    requirePositive(givenName, given_m);
    requirePositive('density_kgPerM3', density_kgPerM3);
    requirePositive('shapeFactor', shapeFactor);
    const particle_kgPerM3 = density_kgPerM3 / shapeFactor;
    const reference_kgPerM3 = shapeFactor * UNIT_DENSITY_kgPerM3;
    const target = settlingGroup(given_m, toAerodynamic ? particle_kgPerM3 : UNIT_DENSITY_kgPerM3, air);
    const sought_kgPerM3 = toAerodynamic ? UNIT_DENSITY_kgPerM3 : particle_kgPerM3;
    const guess = given_m * Math.sqrt(toAerodynamic ? density_kgPerM3 / reference_kgPerM3 : reference_kgPerM3 / density_kgPerM3);
    return solveIncreasingPositive((d) => settlingGroup(d, sought_kgPerM3, air) - target, guess);
  };
}

// The aerodynamic diameter of a particle of the given physical diameter, density and shape factor χ.
export const aerodynamicDiameter = settlingEquivalent('diameter_m', true);

// The physical diameter that settles like the given aerodynamic one.
export const physicalDiameter = settlingEquivalent('aerodynamicDiameter_m', false);
