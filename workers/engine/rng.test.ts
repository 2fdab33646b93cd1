import { describe, expect, it } from 'vitest';
import { Xoshiro128, batchStream } from './rng.ts';
import { fillNormals, nextNormal } from './ziggurat.ts';

describe('xoshiro128**', () => {
  it('reproduces the reference outputs for state (1, 2, 3, 4)', () => {
    // Reference implementation by Blackman & Vigna (prng.di.unimi.it), values computed by hand for the first two.
    const rng = new Xoshiro128(1, 2, 3, 4);
    expect([0, 0, 0, 0].map(() => rng.nextInt32() >>> 0)).toEqual([11520, 0, 5927040, 70819200]);
  });

  it('gives each (seed, batch) its own stream and the same stream every time', () => {
    const draw = (seed: number, batch: number) => Array.from({ length: 4 }, ((r) => () => r.nextInt32())(batchStream(seed, batch)));
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

  it('block filling and single draws give the same sequence', () => {
    const block = new Float64Array(1000);
    fillNormals(batchStream(3, 1), block);
    const single = batchStream(3, 1);
    expect(Array.from(block)).toEqual(Array.from({ length: 1000 }, () => nextNormal(single)));
  });
});
