// Two-sided 95 % Student t quantiles for 1–30 degrees of freedom (standard tables).
const T975 = [
  12.706, 4.303, 3.182, 2.776, 2.571, 2.447, 2.365, 2.306, 2.262, 2.228, 2.201, 2.179, 2.16, 2.145, 2.131, 2.12, 2.11, 2.101, 2.093, 2.086,
  2.08, 2.074, 2.069, 2.064, 2.06, 2.056, 2.052, 2.048, 2.045, 2.042,
];

// Beyond 30 df, the Cornish–Fisher expansion around z = 1.96 is good to 1e-3.
export function tQuantile975(df: number): number {
  if (df <= 30) return T975[Math.max(1, Math.round(df)) - 1];
  const z = 1.959964;
  return z + (z ** 3 + z) / (4 * df) + (5 * z ** 5 + 16 * z ** 3 + 3 * z) / (96 * df * df);
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
  for (let i = 0; i < n; i++) ss += (values[i] - mean) ** 2;
  const standardError = n > 1 ? Math.sqrt(ss / (n - 1) / n) : NaN;
  const half = n > 1 ? tQuantile975(n - 1) * standardError : NaN;
  return { mean, standardError, lo: Math.max(0, mean - half), hi: mean + half };
}
