import { describe, expect, it } from 'vitest';
import { atan, atan2, cos, hypot3, sin } from './trig';
import { draws, worst } from './ulps.test-helper';

// Tolerance: fdlibm states its sin, cos, atan and atan2 are within 1 ulp of the true value (its
// source comments); V8's Math.* is the same library, so 1 ulp from Math.* is the bar.
describe('deterministic trigonometry against Math.*', () => {
  const N = 20000;

  it('sin and cos are within 1 ulp for angles up to a hundred thousand radians', () => {
    for (const span of [2, 20, 2e5]) {
      const xs = draws(N, (u) => (u - 0.5) * span);
      expect(worst(xs, sin, Math.sin)).toBeLessThanOrEqual(1);
      expect(worst(xs, cos, Math.cos)).toBeLessThanOrEqual(1);
    }
  });
  it('atan is within 1 ulp from 1e-300 to 1e300 in size, either sign, over every reduction interval', () => {
    const wide = draws(N, (u) => (u < 0.5 ? -1 : 1) * 10 ** (-300 + 600 * (2 * (u < 0.5 ? u : u - 0.5))));
    expect(worst(wide, atan, Math.atan)).toBeLessThanOrEqual(1);
    const near = draws(N, (u) => (u - 0.5) * 6);
    expect(worst(near, atan, Math.atan)).toBeLessThanOrEqual(1);
  });

  it('atan2 is within 1 ulp in all four quadrants and at extreme ratios', () => {
    const pairs = draws(N, (u) => u).map((u, i) => [(u - 0.5) * 10 ** ((i % 7) - 3), Math.cos(i) * 10 ** ((i % 5) - 2)]);
    const mine = pairs.map(([y, x]) => atan2(y, x));
    const ref = pairs.map(([y, x]) => Math.atan2(y, x));
    expect(
      worst(
        [...mine.keys()],
        (i) => mine[i],
        (i) => ref[i],
      ),
    ).toBeLessThanOrEqual(1);
    for (const [y, x] of [
      [1e200, 1e-200],
      [-1e200, 1e-200],
      [1e200, -1e-200],
      [-1e200, -1e-200],
      [2352899467.7, -4.69e-11],
      [1e-200, -1e200],
      [-1e-200, -1e200],
      [1e-200, 1e200],
    ])
      expect(Object.is(atan2(y, x), Math.atan2(y, x))).toBe(true);
  });

  it('keeps the special values (the ECMAScript table for Math.atan2)', () => {
    expect(sin(0)).toBe(0);
    expect(cos(0)).toBe(1);
    expect(sin(Infinity)).toBeNaN();
    expect(atan(Infinity)).toBe(Math.PI / 2);
    expect(atan(-Infinity)).toBe(-Math.PI / 2);
    expect(atan(NaN)).toBeNaN();
    expect(Object.is(atan(-0), -0)).toBe(true);
    expect(atan(1)).toBe(Math.PI / 4);
    for (const [y, x] of [
      [0, 1],
      [-0, 1],
      [0, -1],
      [-0, -1],
      [0, 0],
      [-0, 0],
      [0, -0],
      [-0, -0],
      [1, 0],
      [-1, 0],
      [1, -0],
      [Infinity, Infinity],
      [-Infinity, Infinity],
      [Infinity, -Infinity],
      [-Infinity, -Infinity],
      [1, Infinity],
      [-1, Infinity],
      [1, -Infinity],
      [-1, -Infinity],
      [Infinity, 1],
      [-Infinity, -1],
      [NaN, 1],
      [1, NaN],
    ])
      expect(Object.is(atan2(y, x), Math.atan2(y, x))).toBe(true);
    expect(hypot3(3, 4)).toBe(5);
    expect(hypot3(2, 3, 6)).toBe(7);
  });
});
