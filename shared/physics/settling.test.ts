import { describe, it, expect } from 'vitest';
import {
  GRAVITY_MPerS2,
  STANDARD_AIR,
  particleReynolds,
  relaxationTime,
  settlingVelocity,
  slipCorrection,
  stokesSettlingVelocity,
} from './index';

const relative = (actual: number, expected: number) => Math.abs(actual / expected - 1);

describe('stokesSettlingVelocity', () => {
  it('gives 3.48e-5 m/s for 1 µm unit density within 0.5 % ([C] Hinds Cc; [M] Hinds App. A11 3.5e-5, from memory)', () => {
    expect(relative(stokesSettlingVelocity(1e-6, 1000), 3.48e-5)).toBeLessThan(0.005);
    expect(relative(stokesSettlingVelocity(1e-6, 1000), 3.5e-5)).toBeLessThan(0.02);
  });

  it('gives 3.06e-3 m/s for 10 µm unit density within 0.5 % ([M] Hinds App. A11, from memory; [C])', () => {
    expect(relative(stokesSettlingVelocity(10e-6, 1000), 3.06e-3)).toBeLessThan(0.005);
  });

  it('gives 0.302 m/s for 100 µm unit density within 0.5 % ([C] plain Stokes, physics.md §3)', () => {
    expect(relative(stokesSettlingVelocity(100e-6, 1000), 0.302)).toBeLessThan(0.005);
  });

  it('equals relaxation time times g', () => {
    expect(stokesSettlingVelocity(3e-6, 2650)).toBeCloseTo(relaxationTime(3e-6, 2650) * GRAVITY_MPerS2, 15);
  });
});

describe('settlingVelocity', () => {
  it('gives about 0.25 m/s for 100 µm unit density, not the 0.302 of plain Stokes ([M] Hinds App. A11, from memory; [C] 0.249)', () => {
    const v = settlingVelocity(100e-6, 1000);
    expect(relative(v, 0.25)).toBeLessThan(0.02);
    expect(relative(v, 0.249)).toBeLessThan(0.005);
    expect(v).toBeLessThan(0.9 * stokesSettlingVelocity(100e-6, 1000));
  });

  it('matches Stokes within 0.05 % at 1 µm and 0.5 % at 10 µm, where Re ≪ 1', () => {
    expect(relative(settlingVelocity(1e-6, 1000), stokesSettlingVelocity(1e-6, 1000))).toBeLessThan(5e-4);
    expect(relative(settlingVelocity(10e-6, 1000), stokesSettlingVelocity(10e-6, 1000))).toBeLessThan(5e-3);
  });

  it('balances weight against Schiller–Naumann drag at 200 µm quartz', () => {
    const d_m = 200e-6;
    const v = settlingVelocity(d_m, 2650);
    const re = particleReynolds(d_m, v);
    const drag_N = (3 * Math.PI * STANDARD_AIR.viscosity_PaS * v * d_m * (1 + 0.15 * re ** 0.687)) / slipCorrection(d_m);
    const weight_N = ((2650 * Math.PI * d_m ** 3) / 6) * GRAVITY_MPerS2;
    expect(relative(drag_N, weight_N)).toBeLessThan(1e-9);
  });

  it('rejects a negative density, naming the argument', () => {
    expect(() => settlingVelocity(1e-6, -1000)).toThrow(/density_kgPerM3.*-1000/);
  });
});

describe('particleReynolds', () => {
  it('is ρ_a·V·d/μ: about 1.7 for a 100 µm unit-density sphere at its terminal speed', () => {
    const re = particleReynolds(100e-6, 0.25);
    expect(re).toBeCloseTo((1.2041 * 0.25 * 100e-6) / 1.8134e-5, 3);
  });

  it('rejects a NaN velocity, naming the argument', () => {
    expect(() => particleReynolds(1e-6, NaN)).toThrow(/velocity_mPerS/);
  });
});

describe('relaxationTime', () => {
  it('gives about 3.6 µs for 1 µm unit density ([M] Hinds Table 5.1, 3.6e-6 s, from memory)', () => {
    expect(relative(relaxationTime(1e-6, 1000), 3.6e-6)).toBeLessThan(0.02);
  });
});
