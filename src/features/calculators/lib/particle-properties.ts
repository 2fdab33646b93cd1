import {
  aerodynamicDiameter,
  airProperties,
  diffusionCoefficient,
  inhalableFraction,
  particleReynolds,
  relaxationTime,
  respirableFraction,
  rmsDisplacement,
  settlingVelocity,
  slipCorrection,
  stokesSettlingVelocity,
  thoracicFraction,
  type AirProperties,
} from '../../../../shared/physics/index';

export interface ParticleMedium {
  density_kgPerM3: number;
  shapeFactor: number;
  air: AirProperties;
  window_s: number;
}

export interface ParticleProperties {
  diameter_m: number;
  slipFactor: number;
  settlingVelocity_mPerS: number;
  stokesVelocity_mPerS: number;
  reynolds: number;
  relaxationTime_s: number;
  diffusivity_m2PerS: number;
  rmsDisplacement_m: number;
  settlingDistance_m: number;
  aerodynamicDiameter_m: number;
  inhalable: number;
  thoracic: number;
  respirable: number;
}

// Stokes' law is taken to hold below this particle Reynolds number (Hinds §3.2).
export const STOKES_REYNOLDS_LIMIT = 1;

export function mediumFor(values: {
  density_kgPerM3: number;
  shapeFactor: number;
  temperature_K: number;
  pressure_Pa: number;
  window_s: number;
}): ParticleMedium {
  const air = airProperties({ temperature_K: values.temperature_K, pressure_Pa: values.pressure_Pa });
  return { density_kgPerM3: values.density_kgPerM3, shapeFactor: values.shapeFactor, air, window_s: values.window_s };
}

// χ multiplies the drag (Hinds, shape-factor form of Stokes' law), so ρ/χ stands in for ρ and D is divided by χ.
export function particleProperties(diameter_m: number, medium: ParticleMedium): ParticleProperties {
  const { air, shapeFactor, window_s } = medium;
  const settlingDensity_kgPerM3 = medium.density_kgPerM3 / shapeFactor;
  const settlingVelocity_mPerS = settlingVelocity(diameter_m, settlingDensity_kgPerM3, air);
  const diffusivity_m2PerS = diffusionCoefficient(diameter_m, air) / shapeFactor;
  const aerodynamicDiameter_m = aerodynamicDiameter(diameter_m, medium.density_kgPerM3, shapeFactor, air);
  return {
    diameter_m,
    slipFactor: slipCorrection(diameter_m, air),
    settlingVelocity_mPerS,
    stokesVelocity_mPerS: stokesSettlingVelocity(diameter_m, settlingDensity_kgPerM3, air),
    reynolds: particleReynolds(diameter_m, settlingVelocity_mPerS, air),
    relaxationTime_s: relaxationTime(diameter_m, settlingDensity_kgPerM3, air),
    diffusivity_m2PerS,
    rmsDisplacement_m: rmsDisplacement(diffusivity_m2PerS, window_s),
    // An airborne particle already falls at terminal velocity, so there is no start-up transient to subtract.
    settlingDistance_m: settlingVelocity_mPerS * window_s,
    aerodynamicDiameter_m,
    inhalable: inhalableFraction(aerodynamicDiameter_m),
    thoracic: thoracicFraction(aerodynamicDiameter_m),
    respirable: respirableFraction(aerodynamicDiameter_m),
  };
}
