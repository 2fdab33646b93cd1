import { describe, it, expect } from 'vitest';
import { bannerFor, exposureRatingCategory, timeWeightedAverage } from './index';

const hours = (h: number) => h * 3600;

describe('timeWeightedAverage', () => {
  it('gives 0.75 mg/m³ for 2 h at 2, 4 h at 0.5 and 2 h at 0 ([C] 29 CFR 1910.1000(d); EN 689)', () => {
    const segments = [
      { concentration_mgPerM3: 2, duration_s: hours(2) },
      { concentration_mgPerM3: 0.5, duration_s: hours(4) },
      { concentration_mgPerM3: 0, duration_s: hours(2) },
    ];
    expect(timeWeightedAverage(segments)).toBeCloseTo(0.75, 12);
  });

  it('counts unsampled time in the 8 h as zero exposure', () => {
    expect(timeWeightedAverage([{ concentration_mgPerM3: 4, duration_s: hours(2) }])).toBeCloseTo(1, 12);
  });

  it('averages over a 15-minute reference for a short-term value', () => {
    expect(timeWeightedAverage([{ concentration_mgPerM3: 6, duration_s: 300 }], 900)).toBeCloseTo(2, 12);
  });

  it('rejects a negative concentration, naming the segment', () => {
    expect(() => timeWeightedAverage([{ concentration_mgPerM3: -1, duration_s: 60 }])).toThrow(/segments\[0\]\.concentration_mgPerM3.*-1/);
  });
});

describe('exposureRatingCategory', () => {
  it.each([
    [0, 0],
    [0.0099, 0],
    [0.01, 1],
    [0.099, 1],
    [0.1, 2],
    [0.49, 2],
    [0.5, 3],
    [1, 3],
    [1.01, 4],
  ])(
    'puts a 95th percentile at %s of the limit in category %s ([S] AIHA Strategy 4th ed.; band edges from memory)',
    (fraction, category) => {
      expect(exposureRatingCategory(fraction)).toBe(category);
    },
  );

  it('rejects NaN, quoting it', () => {
    expect(() => exposureRatingCategory(NaN)).toThrow(/fractionOfLimit.*NaN/);
  });
});

describe('bannerFor', () => {
  it('is clear below half the limit, watch up to the limit and act above it', () => {
    expect(bannerFor(0.0124, 0.025)).toBe('clear');
    expect(bannerFor(0.0125, 0.025)).toBe('watch');
    expect(bannerFor(0.025, 0.025)).toBe('watch');
    expect(bannerFor(0.0251, 0.025)).toBe('act');
  });

  it('rejects a zero limit, naming it', () => {
    expect(() => bannerFor(0.01, 0)).toThrow(/limit_mgPerM3.*got 0/);
  });
});
