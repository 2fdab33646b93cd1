import type { Ci } from './types';

/**
 * Two-sided 5 % critical value: the standard normal 97.5 % quantile, Φ⁻¹(0.975) = 1.959964…
 * (any normal table; the unit test checks it against shared/physics normalQuantile).
 */
export const Z_CRITICAL = 1.96;

export interface Estimate {
  mean: number;
  ci95: Ci;
}

export interface Difference {
  difference: number;
  /** Relative to the reference mean, %; NaN when the reference is zero. */
  differencePercent: number;
  z: number;
  differs: boolean;
  statement: string;
}

// The engine clips the lower bound at the background level, so the wider side is the honest half-width.
export function standardError({ mean, ci95: [lo, hi] }: Estimate): number {
  return Math.max(hi - mean, mean - lo, 0) / Z_CRITICAL;
}

const zText = (z: number) => (Number.isFinite(z) ? (Math.abs(z) >= 100 ? Math.abs(z).toFixed(0) : Math.abs(z).toFixed(1)) : '∞');

/** Normal-theory z-test on two independent Monte-Carlo means, each with SE = CI half-width / 1.96. */
export function compareMeans(reference: Estimate, other: Estimate): Difference {
  const difference = other.mean - reference.mean;
  const se = Math.hypot(standardError(reference), standardError(other));
  const z = se > 0 ? difference / se : difference === 0 ? 0 : Math.sign(difference) * Infinity;
  const differs = Math.abs(z) > Z_CRITICAL;
  return {
    difference,
    differencePercent: reference.mean !== 0 ? (100 * difference) / reference.mean : NaN,
    z,
    differs,
    statement: `${differs ? 'differs' : 'within statistical error'} (z = ${zText(z)})`,
  };
}
