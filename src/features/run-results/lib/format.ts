import type { Ci } from '../../../../shared/schemas/run-result';

// An interval as text; one with no width says nothing about the error, so it never reads as a range.
export { ciText } from '../../../../shared/format/index';

// Relative half-width of the 95 % interval; the lower bound is clipped at zero, so the upper side is the honest one.
export function relativeError(mean: number, [, hi]: Ci): number {
  return mean > 0 ? (100 * (hi - mean)) / mean : NaN;
}
