import { describe, it, expect } from 'vitest';
import stdlibNormalCdf from '@stdlib/stats-base-dists-normal-cdf';
import stdlibErfc from '@stdlib/math-base-special-erfc';
import { erfc, erfcx, normalCdf, normalQuantile } from './index';

const grid = (from: number, to: number, steps: number) => Array.from({ length: steps + 1 }, (_, i) => from + ((to - from) * i) / steps);

describe('erfc', () => {
  it('agrees with @stdlib/math-base-special-erfc to 1e-13 relative from −6 to 26', () => {
    for (const x of grid(-6, 26, 640)) {
      const expected = stdlibErfc(x);
      expect(Math.abs(erfc(x) - expected)).toBeLessThanOrEqual(1e-13 * expected + 1e-300);
    }
  });

  it('keeps relative precision deep in the tail, where 1 − erf would underflow to zero', () => {
    expect(erfc(10) / 2.088487583762545e-45).toBeCloseTo(1, 12);
  });

  it('returns the limits 2 and 0 at −∞ and +∞, and NaN for NaN', () => {
    expect(erfc(-Infinity)).toBe(2);
    expect(erfc(Infinity)).toBe(0);
    expect(erfc(NaN)).toBeNaN();
  });
});

describe('erfcx', () => {
  it('equals e^(x²)·erfc(x) where both factors are representable', () => {
    for (const x of grid(-3, 20, 92)) {
      const expected = Math.exp(x * x) * stdlibErfc(x);
      expect(Math.abs(erfcx(x) / expected - 1)).toBeLessThan(1e-12);
    }
  });

  it('stays finite at x = 100, where e^(x²) alone overflows', () => {
    expect(erfcx(100) * 100 * Math.sqrt(Math.PI)).toBeCloseTo(1, 4);
  });
});

describe('normalCdf', () => {
  it('agrees with @stdlib/stats-base-dists-normal-cdf to 1e-13 relative from −37 to 8', () => {
    for (const z of grid(-37, 8, 900)) {
      const expected = stdlibNormalCdf(z, 0, 1);
      expect(Math.abs(normalCdf(z) - expected)).toBeLessThanOrEqual(1e-13 * expected + 1e-300);
    }
  });
});

describe('normalQuantile', () => {
  it('gives 1.959963984540054 at 0.975 and −2.326347874040841 at 0.01', () => {
    expect(normalQuantile(0.975)).toBeCloseTo(1.959963984540054, 13);
    expect(normalQuantile(0.01)).toBeCloseTo(-2.326347874040841, 13);
  });

  it('inverts normalCdf to 1e-12 relative in both tails and the middle', () => {
    for (const p of [1e-300, 1e-100, 1e-12, 1e-6, 0.001, 0.02425, 0.1, 0.5, 0.7, 0.97575, 0.999, 1 - 1e-9]) {
      const x = normalQuantile(p);
      const back = p < 0.5 ? normalCdf(x) : 1 - normalCdf(-x);
      expect(Math.abs(back / p - 1)).toBeLessThan(1e-12);
    }
  });

  it('returns ∓∞ at 0 and 1 and rejects a value outside [0, 1], quoting it', () => {
    expect(normalQuantile(0)).toBe(-Infinity);
    expect(normalQuantile(1)).toBe(Infinity);
    expect(() => normalQuantile(1.5)).toThrow(/p .*1\.5/);
    expect(() => normalQuantile(NaN)).toThrow(RangeError);
  });
});
