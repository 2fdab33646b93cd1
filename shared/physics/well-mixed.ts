import { exp } from '../det-math/index';
import { requireNonNegative, requirePositive, requireTime } from './validate';

export interface WellMixedRoom {
  generation_mgPerS: number;
  airflow_m3PerS: number;
  volume_m3: number;
  lossRate_perS?: number;
  initial_mgPerM3?: number;
}

// V·dC/dt = G − (Q + kV)·C solved in closed form (well-mixed box model, common practice).
export function wellMixedConcentration(room: WellMixedRoom, time_s: number): number {
  const generation_mgPerS = requireNonNegative('generation_mgPerS', room.generation_mgPerS);
  const airflow_m3PerS = requireNonNegative('airflow_m3PerS', room.airflow_m3PerS);
  const volume_m3 = requirePositive('volume_m3', room.volume_m3);
  const lossRate_perS = requireNonNegative('lossRate_perS', room.lossRate_perS ?? 0);
  const initial_mgPerM3 = requireNonNegative('initial_mgPerM3', room.initial_mgPerM3 ?? 0);
  requireTime('time_s', time_s);
  const removal_perS = airflow_m3PerS / volume_m3 + lossRate_perS;
  if (removal_perS === 0) return initial_mgPerM3 + (generation_mgPerS / volume_m3) * time_s;
  const steady_mgPerM3 = generation_mgPerS / (removal_perS * volume_m3);
  if (time_s === Infinity) return steady_mgPerM3;
  const decay = exp(-removal_perS * time_s);
  return steady_mgPerM3 * (1 - decay) + initial_mgPerM3 * decay;
}

// Settling loss rate in a well-mixed room of height H: k_s = V_TS/H (common practice).
export function settlingLossRate(settlingVelocity_mPerS: number, height_m: number): number {
  return requireNonNegative('settlingVelocity_mPerS', settlingVelocity_mPerS) / requirePositive('height_m', height_m);
}

// Air changes per hour, ACH = 3600·Q/V.
export function airChangesPerHour(airflow_m3PerS: number, volume_m3: number): number {
  return (3600 * requireNonNegative('airflow_m3PerS', airflow_m3PerS)) / requirePositive('volume_m3', volume_m3);
}
