import { exp } from '../det-math/index';
import { type AirConditions, type AirProperties, REFERENCE_AIR, REFERENCE_MEAN_FREE_PATH_m, STANDARD_AIR, scaleMeanFreePath } from './air';
import { requirePositive } from './validate';

// A coefficient set carries the λ it was fitted with, so it is never paired with another λ.
export interface SlipCoefficients {
  a: number;
  b: number;
  c: number;
  referenceMeanFreePath_m: number;
  reference: AirConditions;
}

// Hinds Eq. 3.20, fitted with Hinds's own λ = 0.066 µm at 20 °C, 1 atm: the air model's reference.
export const HINDS_SLIP: SlipCoefficients = {
  a: 1.17,
  b: 0.525,
  c: 0.78,
  referenceMeanFreePath_m: REFERENCE_MEAN_FREE_PATH_m,
  reference: REFERENCE_AIR,
};

// Allen & Raabe 1985 (solid particles), fitted with λ = 0.0673 µm at 23 °C, 1 atm (from memory).
export const ALLEN_RAABE_SLIP: SlipCoefficients = {
  a: 1.142,
  b: 0.558,
  c: 0.999,
  referenceMeanFreePath_m: 0.0673e-6,
  reference: { temperature_K: 296.15, pressure_Pa: 101325 },
};

// Cunningham correction Cc = 1 + Kn·(A + B·exp(−C/Kn)), Kn = 2λ/d (Hinds Eq. 3.20).
export function slipCorrection(diameter_m: number, air: AirProperties = STANDARD_AIR, coefficients: SlipCoefficients = HINDS_SLIP): number {
  requirePositive('diameter_m', diameter_m);
  const meanFreePath_m = scaleMeanFreePath(
    coefficients.referenceMeanFreePath_m,
    coefficients.reference,
    air.temperature_K,
    air.pressure_Pa,
  );
  const knudsen = (2 * meanFreePath_m) / diameter_m;
  return 1 + knudsen * (coefficients.a + coefficients.b * exp(-coefficients.c / knudsen));
}
