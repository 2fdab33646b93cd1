import { atan, cos, pow, sin } from '../../shared/det-math/index';

// Two-sided 95 % Student t quantiles for 1–30 degrees of freedom (standard tables).
const T975 = [
  12.706, 4.303, 3.182, 2.776, 2.571, 2.447, 2.365, 2.306, 2.262, 2.228, 2.201, 2.179, 2.16, 2.145, 2.131, 2.12, 2.11, 2.101, 2.093, 2.086,
  2.08, 2.074, 2.069, 2.064, 2.06, 2.056, 2.052, 2.048, 2.045, 2.042,
];

// Beyond 30 df, the Cornish–Fisher expansion around z = 1.96 is good to 1e-3.
export function tQuantile975(df: number): number {
  if (df <= 30) return T975[Math.max(1, Math.round(df)) - 1];
  const z = 1.959964;
  return z + (pow(z, 3) + z) / (4 * df) + (5 * pow(z, 5) + 16 * pow(z, 3) + 3 * z) / (96 * df * df);
}

export interface Estimate {
  mean: number;
  standardError: number;
  lo: number;
  hi: number;
}

// Independent batches give a t-interval on the mean, the standard Monte-Carlo error estimate.
export function batchEstimate(values: ArrayLike<number>): Estimate {
  const n = values.length;
  let mean = 0;
  for (let i = 0; i < n; i++) mean += values[i];
  mean /= n;
  let ss = 0;
  for (let i = 0; i < n; i++) ss += (values[i] - mean) * (values[i] - mean);
  const standardError = n > 1 ? Math.sqrt(ss / (n - 1) / n) : NaN;
  const half = n > 1 ? tQuantile975(n - 1) * standardError : NaN;
  return { mean, standardError, lo: Math.max(0, mean - half), hi: mean + half };
}

/**
 * Student t distribution function at an integer df, exact (Abramowitz & Stegun 26.7.3/26.7.4:
 * finite sums in θ = atan(t/√df)), so any confidence level gets its quantile without a table.
 */
export function tCdf(t: number, df: number): number {
  const n = Math.max(1, Math.round(df));
  const theta = atan(t / Math.sqrt(n));
  const s = sin(theta);
  const c = cos(theta);
  let a: number;
  if (n % 2 === 1) {
    let sum = 0;
    let term = c;
    if (n > 1) {
      sum = term;
      for (let k = 3; k <= n - 2; k += 2) {
        term *= ((k - 1) / k) * c * c;
        sum += term;
      }
    }
    a = (2 / Math.PI) * (theta + s * sum);
  } else {
    let sum = 1;
    let term = 1;
    for (let k = 2; k <= n - 2; k += 2) {
      term *= ((k - 1) / k) * c * c;
      sum += term;
    }
    a = s * sum;
  }
  // a is P(|T| < |t|) signed with t.
  return 0.5 + 0.5 * a;
}

/** The p quantile of Student's t (p in (0, 1)), by bisection on the exact distribution function. */
export function tQuantile(p: number, df: number): number {
  if (!(p > 0 && p < 1)) throw new RangeError(`tQuantile needs 0 < p < 1, got ${p}`);
  if (p < 0.5) return -tQuantile(1 - p, df);
  let lo = 0;
  let hi = 1;
  while (tCdf(hi, df) < p && hi < 1e12) hi *= 2;
  for (let i = 0; i < 200 && hi - lo > 1e-12 * hi; i++) {
    const mid = 0.5 * (lo + hi);
    if (tCdf(mid, df) < p) lo = mid;
    else hi = mid;
  }
  return 0.5 * (lo + hi);
}

/** The batch t-interval at a chosen two-sided error rate alpha (0.05 gives batchEstimate's 95 %). */
export function batchEstimateAt(values: ArrayLike<number>, alpha: number): Estimate {
  const e = batchEstimate(values);
  const n = values.length;
  if (!(n > 1)) return e;
  const half = tQuantile(1 - alpha / 2, n - 1) * e.standardError;
  return { ...e, lo: Math.max(0, e.mean - half), hi: e.mean + half };
}
