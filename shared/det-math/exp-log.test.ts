import { describe, expect, it } from 'vitest';
import { exp, expm1, log, pow } from './exp-log';
import { draws, worst } from './ulps.test-helper';

// Tolerances: fdlibm states its exp and log are within 1 ulp of the true value (its
// source comments); V8's Math.* is the same library, so 1 ulp from Math.* is the bar, and the
// engine's own angles and logarithms stay well inside the ranges drawn here.
describe('deterministic maths against Math.*', () => {
  const N = 20000;

  it('expm1 is within 1 ulp from 1e-16 to 700 in size, either sign, and exact at the edges', () => {
    const xs = draws(N, (u) => (u < 0.5 ? -1 : 1) * 10 ** (-16 + 18.8 * (2 * (u < 0.5 ? u : u - 0.5))));
    expect(worst(xs, expm1, Math.expm1)).toBeLessThanOrEqual(1);
    for (const x of [0, -0, 1e-300, 0.5 * Math.LN2, Math.LN2, 1.5 * Math.LN2, 40, -40, 709, -745, Infinity, -Infinity])
      expect(Object.is(expm1(x), Math.expm1(x))).toBe(true);
    expect(expm1(NaN)).toBeNaN();
  });

  it('exp is within 1 ulp over the whole finite range and near zero', () => {
    expect(
      worst(
        draws(N, (u) => (u - 0.5) * 1400),
        exp,
        Math.exp,
      ),
    ).toBeLessThanOrEqual(1);
    expect(
      worst(
        draws(N, (u) => (u - 0.5) * 2),
        exp,
        Math.exp,
      ),
    ).toBeLessThanOrEqual(1);
  });

  it('log is within 1 ulp from subnormals to huge values and close to 1', () => {
    expect(
      worst(
        draws(N, (u) => 2 ** ((u - 0.5) * 2090)),
        log,
        Math.log,
      ),
    ).toBeLessThanOrEqual(1);
    expect(
      worst(
        draws(N, (u) => 1 + (u - 0.5) * 1e-3),
        log,
        Math.log,
      ),
    ).toBeLessThanOrEqual(1);
  });

  // pow is exp(y·ln x) with ln x in extended precision: allow 4 ulp for fractional exponents up
  // to 3 (the engine's set-up uses such), 3 ulp for the small integer powers taken by multiplication.
  it('pow is within 4 ulp for fractional exponents and 3 ulp for small integer ones', () => {
    const xs = draws(N, (u) => u * 100);
    for (const y of [0.687, 1.5, 2 / 3, 2.8214, -1 / 3])
      expect(
        worst(
          xs,
          (x) => pow(x, y),
          (x) => x ** y,
        ),
      ).toBeLessThanOrEqual(4);
    for (const y of [2, 3, 5, -2])
      expect(
        worst(
          xs,
          (x) => pow(x, y),
          (x) => x ** y,
        ),
      ).toBeLessThanOrEqual(3);
  });

  it('keeps the special values', () => {
    expect(exp(0)).toBe(1);
    expect(exp(1)).toBe(Math.E);
    expect(exp(-Infinity)).toBe(0);
    expect(exp(800)).toBe(Infinity);
    expect(exp(NaN)).toBeNaN();
    expect(log(1)).toBe(0);
    expect(log(0)).toBe(-Infinity);
    expect(log(-1)).toBeNaN();
    expect(log(Infinity)).toBe(Infinity);
    expect(log(Math.E)).toBe(1);
    expect(pow(2, 10)).toBe(1024);
    expect(pow(-2, 3)).toBe(-8);
    expect(pow(0, -1)).toBe(Infinity);
    expect(pow(4, 0.5)).toBe(2);
  });
});
