import { describe, it, expect } from 'vitest';
import { hatchChoate, massOutsideRange } from './index';

describe('massOutsideRange', () => {
  it('leaves Φ(−1) = 0.1587 out on each side for bounds at MMD/σg and MMD·σg ([S] standard normal table)', () => {
    const out = massOutsideRange(5e-6, 2, 2.5e-6, 10e-6);
    expect(out.below).toBeCloseTo(0.158655, 5);
    expect(out.above).toBeCloseTo(0.158655, 5);
  });

  it('leaves Φ(−2) = 0.02275 above MMD·σg² and keeps tails of 1e-10 without cancellation ([S] standard normal table)', () => {
    expect(massOutsideRange(1e-6, 1.5, 1e-9, 2.25e-6).above).toBeCloseTo(0.0227501, 6);
    const far = massOutsideRange(1e-6, 1.5, 1e-9, 1e-6 * 1.5 ** 6.36).above;
    expect(far).toBeGreaterThan(5e-11);
    expect(far).toBeLessThan(2e-10);
  });

  it('reports most of a 20 nm-count-median fume as below a 0.1 µm bin floor, and none of it once bins reach 1 nm ([C] Hatch–Choate)', () => {
    const { massMedian_m } = hatchChoate(20e-9, 1.6);
    expect(massOutsideRange(massMedian_m, 1.6, 0.1e-6, 100e-6).below).toBeGreaterThan(0.5);
    expect(massOutsideRange(massMedian_m, 1.6, 1e-9, 100e-6).below).toBeLessThan(1e-6);
  });

  it('treats a monodisperse profile as all in or all out', () => {
    expect(massOutsideRange(2e-6, 1, 1e-6, 1e-5)).toEqual({ below: 0, above: 0 });
    expect(massOutsideRange(2e-4, 1, 1e-6, 1e-4)).toEqual({ below: 0, above: 1 });
  });

  it('rejects bounds that run backwards, quoting them', () => {
    expect(() => massOutsideRange(1e-6, 2, 1e-5, 1e-6)).toThrow(/\[0\.00001, 0\.000001\]/);
  });
});
