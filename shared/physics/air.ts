import { pow } from '../det-math/index';
import { AIR_MOLAR_MASS_kgPerMol, GAS_CONSTANT_JPerMolK } from './constants';
import { requirePositive } from './validate';

export interface AirConditions {
  temperature_K: number;
  pressure_Pa: number;
}

export interface AirProperties extends AirConditions {
  density_kgPerM3: number;
  viscosity_PaS: number;
  meanFreePath_m: number;
}

export const REFERENCE_AIR: AirConditions = { temperature_K: 293.15, pressure_Pa: 101325 };

// Hinds App. A4: 0.066 µm at 20 °C and 1 atm, the λ that Hinds Eq. 3.20 was fitted with.
export const REFERENCE_MEAN_FREE_PATH_m = 0.066e-6;

// Sutherland's law, constants from the US Standard Atmosphere 1976.
export function sutherlandViscosity(temperature_K: number): number {
  return (1.458e-6 * pow(temperature_K, 1.5)) / (temperature_K + 110.4);
}

// Kinetic theory gives λ ∝ (μ/p)·√T (Hinds Eq. 2.25 form), anchored to a reference λ.
export function scaleMeanFreePath(
  referenceMeanFreePath_m: number,
  reference: AirConditions,
  temperature_K: number,
  pressure_Pa: number,
): number {
  const viscosityRatio = sutherlandViscosity(temperature_K) / sutherlandViscosity(reference.temperature_K);
  return (
    referenceMeanFreePath_m * viscosityRatio * (reference.pressure_Pa / pressure_Pa) * Math.sqrt(temperature_K / reference.temperature_K)
  );
}

// Ideal-gas density of dry air, Sutherland viscosity, Hinds App. A4 mean free path.
export function airProperties(conditions: AirConditions = REFERENCE_AIR): AirProperties {
  const temperature_K = requirePositive('temperature_K', conditions.temperature_K);
  const pressure_Pa = requirePositive('pressure_Pa', conditions.pressure_Pa);
  return {
    temperature_K,
    pressure_Pa,
    density_kgPerM3: (pressure_Pa * AIR_MOLAR_MASS_kgPerMol) / (GAS_CONSTANT_JPerMolK * temperature_K),
    viscosity_PaS: sutherlandViscosity(temperature_K),
    meanFreePath_m: scaleMeanFreePath(REFERENCE_MEAN_FREE_PATH_m, REFERENCE_AIR, temperature_K, pressure_Pa),
  };
}

export const STANDARD_AIR: AirProperties = airProperties();
