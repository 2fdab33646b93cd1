import type { Banner } from '../vocabulary/fractions';
import { requireNonNegative, requirePositive } from './validate';

export interface ExposureSegment {
  concentration_mgPerM3: number;
  duration_s: number;
}

export type ExposureRating = 0 | 1 | 2 | 3 | 4;

const EIGHT_HOURS_s = 8 * 3600;

// Unsampled time beyond the segments counts as zero exposure: TWA = Σ Cᵢ·tᵢ / 8 h (29 CFR 1910.1000(d); EN 689).
export function timeWeightedAverage(segments: readonly ExposureSegment[], reference_s = EIGHT_HOURS_s): number {
  requirePositive('reference_s', reference_s);
  let dose = 0;
  segments.forEach((segment, i) => {
    dose +=
      requireNonNegative(`segments[${i}].concentration_mgPerM3`, segment.concentration_mgPerM3) *
      requireNonNegative(`segments[${i}].duration_s`, segment.duration_s);
  });
  return dose / reference_s;
}

// AIHA exposure rating bands on the 95th percentile as a fraction of the OEL (AIHA Strategy, 4th ed.; edges from memory).
export function exposureRatingCategory(fractionOfLimit: number): ExposureRating {
  requireNonNegative('fractionOfLimit', fractionOfLimit);
  if (fractionOfLimit < 0.01) return 0;
  if (fractionOfLimit < 0.1) return 1;
  if (fractionOfLimit < 0.5) return 2;
  if (fractionOfLimit <= 1) return 3;
  return 4;
}

// Half the limit is the US action level (29 CFR 1910.1053), so "watch" starts where action planning does.
export function bannerFor(upperCi_mgPerM3: number, limit_mgPerM3: number): Banner {
  requireNonNegative('upperCi_mgPerM3', upperCi_mgPerM3);
  requirePositive('limit_mgPerM3', limit_mgPerM3);
  if (upperCi_mgPerM3 < 0.5 * limit_mgPerM3) return 'clear';
  if (upperCi_mgPerM3 <= limit_mgPerM3) return 'watch';
  return 'act';
}
