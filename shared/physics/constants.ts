// Exact SI value since the 2019 redefinition of the kelvin.
export const BOLTZMANN_J_PER_K = 1.380649e-23;

// Handbook tables use 9.81, so the check values do too.
export const GRAVITY_MPerS2 = 9.81;

export const GAS_CONSTANT_JPerMolK = 8.314462618;

export const AIR_MOLAR_MASS_kgPerMol = 0.0289644;

// Aerodynamic diameter is defined against spheres of this density.
export const UNIT_DENSITY_kgPerM3 = 1000;
