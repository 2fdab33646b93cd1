import { describe, it, expect } from 'vitest';
import { diffusionCoefficient, rmsDisplacement } from './index';

// [M] Hinds Table 7.1, from memory; tolerance 3 %.
const HINDS_TABLE_7_1: [number, number][] = [
  [0.01, 5.4e-8],
  [0.1, 6.9e-10],
  [1, 2.7e-11],
  [10, 2.4e-12],
];

describe('diffusionCoefficient', () => {
  it.each(HINDS_TABLE_7_1)('gives D(%s µm) = %s m²/s within 3 % ([M] Hinds Table 7.1, from memory)', (d_um, expected) => {
    expect(Math.abs(diffusionCoefficient(d_um * 1e-6) / expected - 1)).toBeLessThan(0.03);
  });

  it('rejects a zero diameter, naming the argument', () => {
    expect(() => diffusionCoefficient(0)).toThrow(/diameter_m.*got 0/);
  });
});

describe('rmsDisplacement', () => {
  it('is √(2Dt) along one axis ([S] Hinds Eq. 7.18)', () => {
    expect(rmsDisplacement(5e-9, 100)).toBeCloseTo(1e-3, 15);
  });

  it('moves a 1 µm particle only about 7 µm in a second, far less than room eddies would', () => {
    const x_m = rmsDisplacement(diffusionCoefficient(1e-6), 1);
    expect(x_m).toBeGreaterThan(6e-6);
    expect(x_m).toBeLessThan(8e-6);
    expect(x_m).toBeLessThan(rmsDisplacement(0.001, 1) / 1000);
  });

  it('rejects a negative time, naming the argument', () => {
    expect(() => rmsDisplacement(1e-9, -1)).toThrow(/time_s.*-1/);
  });
});
