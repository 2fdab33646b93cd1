import tQuantile from '@stdlib/stats-base-dists-t-quantile';
import { describe, expect, it } from 'vitest';
import { DEFAULT_DAY_TO_DAY_GSD, dailyP95 } from './day-to-day';

// Standard normal 95th percentile from @stdlib, as Student's t with unbounded degrees of freedom.
const z95 = tQuantile(0.95, 1e12);

// Lognormal with arithmetic mean m and GSD g: σ = ln g, μ = ln m − σ²/2, X95 = exp(μ + z95·σ) [S] (lognormal moments, e.g. AIHA Strategy, 4th ed., appendix).
const lognormalP95 = (mean: number, gsd: number) => Math.exp(Math.log(mean) - 0.5 * Math.log(gsd) ** 2 + z95 * Math.log(gsd));

describe('dailyP95', () => {
  it.each([1.5, 2, 2.5, 2.7, 4])('matches the lognormal 95th percentile for GSD %s to the rounding of z = 1.645', (gsd) => {
    expect(dailyP95(0.1, gsd) / lognormalP95(0.1, gsd)).toBeCloseTo(1, 3);
  });

  it('is the mean itself when days do not vary (GSD 1)', () => {
    expect(dailyP95(0.02, 1)).toBe(0.02);
  });

  it('puts the default GSD 2.7 at about 3.1 × the mean, so Clear needs a mean under a sixth of the limit ([C] 2.7^1.645 / e^(½ ln² 2.7))', () => {
    expect(DEFAULT_DAY_TO_DAY_GSD).toBe(2.7);
    expect(dailyP95(1, DEFAULT_DAY_TO_DAY_GSD)).toBeCloseTo(3.13, 2);
  });

  it('rejects a GSD below 1 and a negative mean, quoting the value', () => {
    expect(() => dailyP95(1, 0.8)).toThrow(/gsd.*0\.8/);
    expect(() => dailyP95(-1, 2)).toThrow(/mean_mgPerM3.*-1/);
  });
});
