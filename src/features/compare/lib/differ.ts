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
  /** NaN when either interval has no width: its error is not known, so neither is the difference's. */
  z: number;
  differs: boolean;
  statement: string;
}

// The engine clips the lower bound at the background level, so the wider side is the honest half-width.
export function standardError({ mean, ci95: [lo, hi] }: Estimate): number {
  return Math.max(hi - mean, mean - lo, 0) / Z_CRITICAL;
}

const zText = (z: number) => (Math.abs(z) >= 100 ? Math.abs(z).toFixed(0) : Math.abs(z).toFixed(1));

/**
 * Normal-theory z-test on two independent Monte-Carlo means, each with SE = CI half-width / 1.96. An interval with
 * no width (too few particles reached the zone) says nothing about its error, so the difference is not judged.
 */
export function compareMeans(reference: Estimate, other: Estimate): Difference {
  const difference = other.mean - reference.mean;
  const differencePercent = reference.mean !== 0 ? (100 * difference) / reference.mean : NaN;
  if (!(reference.ci95[1] > reference.ci95[0] && other.ci95[1] > other.ci95[0]))
    return { difference, differencePercent, z: NaN, differs: false, statement: 'not judged: an interval is not known' };
  const se = Math.hypot(standardError(reference), standardError(other));
  const z = se > 0 ? difference / se : 0;
  const differs = Math.abs(z) > Z_CRITICAL;
  return {
    difference,
    differencePercent,
    z,
    differs,
    statement: `${differs ? 'differs' : 'within statistical error'} (z = ${zText(z)})`,
  };
}
