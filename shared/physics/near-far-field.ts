import { exp } from '../det-math/index';
import { requireNonNegative, requirePositive, requireTime } from './validate';

export interface NearFarFieldModel {
  generation_mgPerS: number;
  airflow_m3PerS: number;
  nearFieldVolume_m3: number;
  farFieldVolume_m3: number;
  interzonalAirflow_m3PerS: number;
  lossRate_perS?: number;
}

export interface NearFarFieldConcentration {
  near_mgPerM3: number;
  far_mgPerM3: number;
}

// Two-zone model (Nicas 1996; Keil et al. 2009) solved through the eigenvalues of its 2×2 system, from C(0) = 0.
export function nearFieldFarField(model: NearFarFieldModel, time_s: number): NearFarFieldConcentration {
  const g = requireNonNegative('generation_mgPerS', model.generation_mgPerS);
  const q = requireNonNegative('airflow_m3PerS', model.airflow_m3PerS);
  const vN = requirePositive('nearFieldVolume_m3', model.nearFieldVolume_m3);
  const vF = requirePositive('farFieldVolume_m3', model.farFieldVolume_m3);
  const beta = requirePositive('interzonalAirflow_m3PerS', model.interzonalAirflow_m3PerS);
  const k = requireNonNegative('lossRate_perS', model.lossRate_perS ?? 0);
  requireTime('time_s', time_s);
  if (q === 0 && k === 0) {
    throw new RangeError(`airflow_m3PerS or lossRate_perS must be positive for a steady state, got 0 and 0`);
  }
  const a11 = -(beta / vN + k);
  const a12 = beta / vN;
  const a21 = beta / vF;
  const a22 = -((beta + q) / vF + k);
  const det = a11 * a22 - a12 * a21;
  const steadyNear = (-a22 * g) / vN / det;
  const steadyFar = (a21 * g) / vN / det;
  if (time_s === Infinity) return { near_mgPerM3: steadyNear, far_mgPerM3: steadyFar };

  const halfTrace = 0.5 * (a11 + a22);
  const root = Math.sqrt(0.25 * (a11 - a22) * (a11 - a22) + a12 * a21);
  const lambda1 = halfTrace + root;
  const lambda2 = halfTrace - root;
  // Eigenvectors (a12, λ − a11); coefficients chosen so that C(0) = 0.
  const w1 = lambda1 - a11;
  const w2 = lambda2 - a11;
  const c1 = (-steadyFar + (w2 * steadyNear) / a12) / (w1 - w2);
  const c2 = (steadyFar - (w1 * steadyNear) / a12) / (w1 - w2);
  const e1 = exp(lambda1 * time_s);
  const e2 = exp(lambda2 * time_s);
  return {
    near_mgPerM3: steadyNear + a12 * (c1 * e1 + c2 * e2),
    far_mgPerM3: steadyFar + c1 * w1 * e1 + c2 * w2 * e2,
  };
}
