import { readableNumber } from '../../../../shared/format/index';
import type { Ci } from '../../../../shared/schemas/run-result';

export const ciText = ([lo, hi]: Ci, digits = 3): string => `${readableNumber(lo, digits)}–${readableNumber(hi, digits)}`;

// Relative half-width of the 95 % interval; the lower bound is clipped at zero, so the upper side is the honest one.
export function relativeError(mean: number, [, hi]: Ci): number {
  return mean > 0 ? (100 * (hi - mean)) / mean : NaN;
}
