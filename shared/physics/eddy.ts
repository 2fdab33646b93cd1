import { exp, pow } from '../det-math/index';
import { erfc, erfcx } from './normal';
import { requireNonNegative, requirePositive, requireTime } from './validate';

export type ReflectingBoundary = 'free' | 'floor' | 'wall-floor' | 'corner';

export interface ContinuousSource {
  generation_mgPerS: number;
  diffusivity_m2PerS: number;
  lossRate_perS?: number;
  boundary?: ReflectingBoundary;
}

export interface Puff {
  mass_mg: number;
  diffusivity_m2PerS: number;
  lossRate_perS?: number;
  boundary?: ReflectingBoundary;
}

const IMAGE_COUNT: Record<ReflectingBoundary, number> = { free: 1, floor: 2, 'wall-floor': 4, corner: 8 };

// A source on n reflecting planes through it has 2ⁿ coincident images (method of images).
function imageCount(boundary: ReflectingBoundary = 'free'): number {
  if (!Object.hasOwn(IMAGE_COUNT, boundary)) {
    throw new RangeError(`boundary must be free, floor, wall-floor or corner, got ${String(boundary)}`);
  }
  return IMAGE_COUNT[boundary];
}

// Continuous point source with first-order loss (Carslaw & Jaeger, from memory): k = 0 gives G/(4πDr)·erfc(r/√(4Dt)).
export function eddyContinuousSource(source: ContinuousSource, distance_m: number, time_s: number): number {
  const g = requireNonNegative('generation_mgPerS', source.generation_mgPerS);
  const d = requirePositive('diffusivity_m2PerS', source.diffusivity_m2PerS);
  const k = requireNonNegative('lossRate_perS', source.lossRate_perS ?? 0);
  const r = requirePositive('distance_m', distance_m);
  requireTime('time_s', time_s);
  const scale = (imageCount(source.boundary) * g) / (4 * Math.PI * d * r);
  const decayLength = r * Math.sqrt(k / d);
  if (time_s === Infinity) return scale * exp(-decayLength);
  if (time_s === 0) return 0;
  const u = r / Math.sqrt(4 * d * time_s);
  const v = Math.sqrt(k * time_s);
  // The growing exponential is folded into erfcx so that neither factor overflows.
  const rising = exp(decayLength - (u + v) * (u + v)) * erfcx(u + v);
  return 0.5 * scale * (exp(-decayLength) * erfc(u - v) + rising);
}

// Instantaneous point puff C = M/(4πDt)^(3/2)·exp(−r²/(4Dt))·e^(−kt) (Carslaw & Jaeger, from memory).
export function eddyPuff(puff: Puff, distance_m: number, time_s: number): number {
  const m = requireNonNegative('mass_mg', puff.mass_mg);
  const d = requirePositive('diffusivity_m2PerS', puff.diffusivity_m2PerS);
  const k = requireNonNegative('lossRate_perS', puff.lossRate_perS ?? 0);
  const r = requireNonNegative('distance_m', distance_m);
  const t = requirePositive('time_s', time_s);
  const spread = 4 * d * t;
  return ((imageCount(puff.boundary) * m) / pow(Math.PI * spread, 1.5)) * exp(-(r * r) / spread - k * t);
}

// Room eddy diffusivity D = (0.52·ACH + 8.61e-5 s⁻¹)·V^(2/3), ACH in s⁻¹ (Cheng et al. 2011 line of work, from memory).
export function eddyDiffusivityFromVentilation(airChanges_perH: number, volume_m3: number): number {
  const airChanges_perS = requireNonNegative('airChanges_perH', airChanges_perH) / 3600;
  return (0.52 * airChanges_perS + 8.61e-5) * pow(requirePositive('volume_m3', volume_m3), 2 / 3);
}

export interface RoomDiffusivity {
  value_m2PerS: number;
  range: readonly [number, number];
  clamped: boolean;
  basis: string;
}

// Measured in real rooms, < 0.2 to > 5 ACH (Cheng et al., Environ. Sci. Technol. 45:4016, 2011).
// The floor holds at ACH 0: an occupied workplace mixes at least as much as the stillest house measured.
export const MEASURED_ROOM_DIFFUSIVITY_m2PerS: readonly [number, number] = [0.001, 0.013];

// The ACH·V^(2/3) estimate, clamped to a measured range: outside it the correlation is an extrapolation.
export function roomEddyDiffusivity(
  airChanges_perH: number,
  volume_m3: number,
  range: readonly [number, number] = MEASURED_ROOM_DIFFUSIVITY_m2PerS,
): RoomDiffusivity {
  const lo = requirePositive('range[0]', range[0]);
  const hi = requirePositive('range[1]', range[1]);
  if (hi < lo) throw new RangeError(`range must run from low to high, got [${lo}, ${hi}]`);
  const estimate_m2PerS = eddyDiffusivityFromVentilation(airChanges_perH, volume_m3);
  const value_m2PerS = Math.min(hi, Math.max(lo, estimate_m2PerS));
  const clamped = value_m2PerS !== estimate_m2PerS;
  const formula = `(0.52·ACH + 8.61e-5 s⁻¹)·V^(2/3) gives ${estimate_m2PerS.toPrecision(3)} m²/s`;
  const bound = estimate_m2PerS < lo ? 'raised to the floor' : 'lowered to the ceiling';
  const basis = clamped
    ? `${formula}, ${bound} of the ${lo}–${hi} m²/s measured in rooms`
    : `${formula}, inside the ${lo}–${hi} m²/s measured in rooms`;
  return { value_m2PerS, range: [lo, hi], clamped, basis };
}
