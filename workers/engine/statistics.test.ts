import { describe, expect, it } from 'vitest';
import tQuantile from '@stdlib/stats-base-dists-t-quantile';
import { batchEstimate, batchEstimateAt, tQuantile as tQuantileAt, tQuantile975 } from './statistics';

const range = (from: number, to: number) => Array.from({ length: to - from + 1 }, (_, i) => from + i);

describe('Student t quantile at 0.975 (checked against @stdlib/stats-base-dists-t-quantile)', () => {
  it.each(range(1, 30))('matches the reference to half a unit of the table’s third decimal at %i df', (df) => {
    expect(Math.abs(tQuantile975(df) - tQuantile(0.975, df))).toBeLessThanOrEqual(5e-4);
  });

  it.each([31, 40, 60, 120, 1000, 1e6])('matches the reference to 1e-4 at %i df, beyond the table', (df) => {
    expect(Math.abs(tQuantile975(df) - tQuantile(0.975, df))).toBeLessThan(1e-4);
  });

  it('stays within 1e-4 of the reference at every df from 31 to 2000', () => {
    const worst = Math.max(...range(31, 2000).map((df) => Math.abs(tQuantile975(df) - tQuantile(0.975, df))));
    expect(worst).toBeLessThan(1e-4);
  });
});

describe('batch estimate', () => {
  it('puts the 95 % interval at the mean ± t(0.975, n − 1) standard errors', () => {
    // Sample 1, 2, 3, 4: mean 2.5, s² = 5/3, standard error √(5/12) (textbook formulas).
    const e = batchEstimate([1, 2, 3, 4]);
    const se = Math.sqrt(5 / 12);
    expect(e.mean).toBe(2.5);
    expect(e.standardError).toBeCloseTo(se, 12);
    expect(e.hi - e.mean).toBeCloseTo(tQuantile(0.975, 3) * se, 3);
  });
});

describe('Student t at any level (exact distribution function, checked against @stdlib)', () => {
  it.each([
    [0.975, 1],
    [0.975, 2],
    [0.9995, 19],
    [0.99996, 19],
    [0.995, 39],
    [0.9875, 79],
    [0.99, 1279],
    [0.6, 7],
  ])('matches the reference quantile at p = %s, %i df', (p, df) => {
    expect(tQuantileAt(p, df)).toBeCloseTo(tQuantile(p, df), 6);
  });
  it('is symmetric about zero', () => {
    expect(tQuantileAt(0.1, 12)).toBeCloseTo(-tQuantile(0.9, 12), 8);
  });
  it('widens the batch interval at a smaller error rate and gives the 95 % one at alpha = 0.05', () => {
    const values = [1, 2, 3, 4, 5, 6];
    expect(batchEstimateAt(values, 0.05).hi).toBeCloseTo(batchEstimate(values).hi, 3);
    expect(batchEstimateAt(values, 0.001).hi).toBeGreaterThan(batchEstimate(values).hi);
  });
});
