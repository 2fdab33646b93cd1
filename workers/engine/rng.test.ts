import { describe, expect, it } from 'vitest';
import { Xoshiro128, batchStream } from './rng';
import stdlibNormalCdf from '@stdlib/stats-base-dists-normal-cdf';
import { fillNormals } from './ziggurat';

describe('xoshiro128**', () => {
  it('reproduces the reference outputs for state (1, 2, 3, 4)', () => {
    // Reference implementation by Blackman & Vigna (prng.di.unimi.it), values computed by hand for the first two.
    const rng = new Xoshiro128(1, 2, 3, 4);
    expect([0, 0, 0, 0].map(() => rng.nextInt32() >>> 0)).toEqual([11520, 0, 5927040, 70819200]);
  });

  it('gives each (seed, batch) its own stream and the same stream every time', () => {
    const draw = (seed: number, batch: number) =>
      Array.from(
        { length: 4 },
        (
          (r) => () =>
            r.nextInt32()
        )(batchStream(seed, batch)),
      );
    expect(draw(1, 0)).toEqual(draw(1, 0));
    expect(draw(1, 0)).not.toEqual(draw(1, 1));
    expect(draw(1, 0)).not.toEqual(draw(2, 0));
  });
});

describe('ziggurat normals', () => {
  const n = 400_000;
  const values = new Float64Array(n);
  fillNormals(batchStream(42, 0), values);
  const moment = (k: number) => values.reduce((a, v) => a + v ** k, 0) / n;

  it('have mean 0, variance 1, skewness 0 and kurtosis 3 within 4 standard errors', () => {
    // Standard errors of sample moments of N(0,1): √(1/n), √(2/n), √(15/n), √(96/n) (normal theory, common practice).
    expect(Math.abs(moment(1))).toBeLessThan(4 * Math.sqrt(1 / n));
    expect(Math.abs(moment(2) - 1)).toBeLessThan(4 * Math.sqrt(2 / n));
    expect(Math.abs(moment(3))).toBeLessThan(4 * Math.sqrt(15 / n));
    expect(Math.abs(moment(4) - 3)).toBeLessThan(4 * Math.sqrt(96 / n));
  });

  it('put 0.27 % of draws beyond ±3σ, as the normal tail does', () => {
    const p = 0.0026998;
    const tail = values.reduce((a, v) => a + (Math.abs(v) > 3 ? 1 : 0), 0) / n;
    expect(Math.abs(tail - p)).toBeLessThan(4 * Math.sqrt((p * (1 - p)) / n));
  });

  it('beyond the ziggurat base (±3.44σ) come only from its tail path, as often as the normal tail', () => {
    // 2·(1 − Φ(3.5)) from @stdlib's normal CDF.
    const p = 2 * (1 - stdlibNormalCdf(3.5, 0, 1));
    const tail = values.reduce((a, v) => a + (Math.abs(v) > 3.5 ? 1 : 0), 0) / n;
    expect(Math.abs(tail - p)).toBeLessThan(4 * Math.sqrt((p * (1 - p)) / n));
  });

  it('follow the normal CDF (Kolmogorov–Smirnov against @stdlib, 1 % level)', () => {
    const sorted = Float64Array.from(values).sort();
    let d = 0;
    for (let i = 0; i < n; i++) {
      const f = stdlibNormalCdf(sorted[i], 0, 1);
      d = Math.max(d, Math.abs(f - i / n), Math.abs((i + 1) / n - f));
    }
    // Asymptotic critical value 1.628/√n at α = 0.01 (Kolmogorov distribution, common practice).
    expect(d).toBeLessThan(1.628 / Math.sqrt(n));
  });

  it('give the same block for the same stream, block after block', () => {
    const fill = () => {
      const rng = batchStream(3, 1);
      const a = new Float64Array(6144);
      const b = new Float64Array(6144);
      fillNormals(rng, a);
      fillNormals(rng, b);
      return [...a, ...b];
    };
    const first = fill();
    expect(fill()).toEqual(first);
    expect(new Set(first).size).toBe(first.length);
  });
});
