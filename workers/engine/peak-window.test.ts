import { describe, expect, it } from 'vitest';
import { batchStream } from './rng';
import { highestWindow, splitPeak } from './peak-window';

const normal = (rng: ReturnType<typeof batchStream>) =>
  Math.sqrt(-2 * Math.log(rng.nextUniform())) * Math.cos(2 * Math.PI * rng.nextUniform());

// Batches of a known concentration profile with independent lognormal noise per time bin: factor e^(σz − σ²/2), σ = 0.6, mean exactly 1.
function batches(profile: number[], count: number, seed: string): Float64Array[] {
  return Array.from({ length: count }, (_, k) => {
    const rng = batchStream(seed, k);
    return Float64Array.from(profile, (c) => c * Math.exp(0.6 * normal(rng) - 0.18));
  });
}

// The old estimator: the largest window mean of the batch-mean series.
function maxOfMeans(perBatch: Float64Array[], width: number): number {
  const mean = perBatch[0].map((_, i) => perBatch.reduce((a, s) => a + s[i], 0) / perBatch.length);
  const start = highestWindow(mean, width);
  return mean.slice(start, start + width).reduce((a, v) => a + v, 0) / width;
}

const meanOf = (v: number[]) => v.reduce((a, x) => a + x, 0) / v.length;
const seOf = (v: number[]) => Math.sqrt(v.reduce((a, x) => a + (x - meanOf(v)) ** 2, 0) / (v.length - 1) / v.length);

describe('split-batch peak 15-min average', () => {
  it('finds the first window of the largest sum', () => {
    expect(highestWindow([0, 1, 5, 5, 1, 0, 5, 5], 2)).toBe(2);
    expect(highestWindow([3, 3, 3], 3)).toBe(0);
  });

  it('is unbiased on a flat series, where the maximum of noisy window means lies above the truth', () => {
    // Flat 1 mg/m³ over 120 bins, a 15-bin window, 20 batches; 300 repeats with their own seeds.
    const profile = new Array(120).fill(1);
    const split: number[] = [];
    const naive: number[] = [];
    for (let r = 0; r < 300; r++) {
      const b = batches(profile, 20, `flat:${r}`);
      split.push(splitPeak(b, 15, 1).mean);
      naive.push(maxOfMeans(b, 15));
    }
    expect(Math.abs(meanOf(split) - 1)).toBeLessThan(3 * seOf(split));
    expect(meanOf(naive) - 1).toBeGreaterThan(10 * seOf(naive));
  });

  it('estimates a clear peak at its true height, with an interval that covers it about 95 % of the time', () => {
    // Background 0.2 with a 15-bin plateau at 2 mg/m³ from bin 40: the true peak 15-min average is 2.
    const profile = Array.from({ length: 120 }, (_, i) => (i >= 40 && i < 55 ? 2 : 0.2));
    const estimates: number[] = [];
    let covered = 0;
    for (let r = 0; r < 300; r++) {
      const e = splitPeak(batches(profile, 20, `peak:${r}`), 15, 60);
      estimates.push(e.mean);
      if (e.ci && e.ci[0] <= 2 && e.ci[1] >= 2) covered++;
    }
    expect(Math.abs(meanOf(estimates) - 2)).toBeLessThan(3 * seOf(estimates));
    // 95 % nominal; Binomial(300, 0.95) stays within 0.91–0.99 with high probability (common practice).
    expect(covered / 300).toBeGreaterThan(0.9);
    expect(covered / 300).toBeLessThan(0.99);
  });

  it('says where the window lies and gives no interval when only one batch estimates it', () => {
    const profile = Array.from({ length: 120 }, (_, i) => (i >= 40 && i < 55 ? 2 : 0.2));
    const e = splitPeak(batches(profile, 2, 'two'), 15, 60);
    expect(e.ci).toBeNull();
    expect(e.window_s[1] - e.window_s[0]).toBe(900);
  });
});
