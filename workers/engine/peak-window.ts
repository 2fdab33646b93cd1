import { batchEstimate } from './statistics';

export interface PeakEstimate {
  mean: number;
  /** 95 % interval from the estimating half; null when that half has fewer than two batches. */
  ci: [number, number] | null;
  window_s: [number, number];
}

/** Start of the window of `width` bins with the largest mean over `series` (the first one on a tie). */
export function highestWindow(series: ArrayLike<number>, width: number): number {
  let sum = 0;
  for (let i = 0; i < width; i++) sum += series[i];
  let best = sum;
  let bestStart = 0;
  for (let start = 1; start + width <= series.length; start++) {
    sum += series[start + width - 1] - series[start - 1];
    if (sum > best * (1 + 1e-12) + 1e-300) {
      best = sum;
      bestStart = start;
    }
  }
  return bestStart;
}

function windowMean(series: ArrayLike<number>, start: number, width: number): number {
  let sum = 0;
  for (let i = start; i < start + width; i++) sum += series[i];
  return sum / width;
}

/**
 * The peak 15-min average without the upward pull of noise: the maximum of noisy window means
 * favours whichever window the noise lifted, so the window is chosen on the even batches and its
 * concentration is estimated on the odd ones, which had no say in the choice. Given the window,
 * the odd batches are independent, so their mean is unbiased for that window's concentration and
 * their t-interval holds. `perBatch` is in batch order; each series has one value per time bin.
 */
export function splitPeak(perBatch: readonly ArrayLike<number>[], width: number, timeBin_s: number): PeakEstimate {
  const bins = perBatch[0]?.length ?? 0;
  const w = Math.max(1, Math.min(width, bins));
  const chooser = new Float64Array(bins);
  const estimators: ArrayLike<number>[] = [];
  perBatch.forEach((series, k) => {
    if (k % 2 === 0) for (let i = 0; i < bins; i++) chooser[i] += series[i];
    else estimators.push(series);
  });
  const start = highestWindow(chooser, w);
  const values = estimators.map((s) => windowMean(s, start, w));
  const window_s: [number, number] = [start * timeBin_s, (start + w) * timeBin_s];
  if (values.length === 0) return { mean: windowMean(chooser, start, w), ci: null, window_s };
  const e = batchEstimate(values);
  return { mean: e.mean, ci: values.length > 1 ? [e.lo, e.hi] : null, window_s };
}
