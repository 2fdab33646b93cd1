import { describe, it, expect } from 'vitest';
import { aerodynamicDiameter, physicalDiameter, slipCorrection } from './index';

describe('aerodynamicDiameter', () => {
  it('approaches d·√(ρ/(χρ₀)) above 3 µm ([M] Hinds Eq. 3.26 form, from memory)', () => {
    const d_a = aerodynamicDiameter(10e-6, 2650, 1.36);
    expect(Math.abs(d_a / (10e-6 * Math.sqrt(2650 / 1360)) - 1)).toBeLessThan(0.005);
  });

  it('satisfies d_a²·ρ₀·Cc(d_a) = d_p²·(ρ_p/χ)·Cc(d_p) with slip on both sides at 0.3 µm', () => {
    const d_p = 0.3e-6;
    const d_a = aerodynamicDiameter(d_p, 2650, 1.2);
    const lhs = d_a ** 2 * 1000 * slipCorrection(d_a);
    const rhs = d_p ** 2 * (2650 / 1.2) * slipCorrection(d_p);
    expect(Math.abs(lhs / rhs - 1)).toBeLessThan(1e-10);
  });

  it('differs from the no-slip shortcut by more than 5 % for a 0.1 µm quartz sphere', () => {
    const shortcut = 0.1e-6 * Math.sqrt(2.65);
    expect(aerodynamicDiameter(0.1e-6, 2650) / shortcut).toBeGreaterThan(1.05);
  });

  it('leaves a unit-density sphere unchanged', () => {
    expect(aerodynamicDiameter(2e-6, 1000)).toBeCloseTo(2e-6, 15);
  });

  it('rejects a negative shape factor, naming it', () => {
    expect(() => aerodynamicDiameter(1e-6, 1000, -1)).toThrow(/shapeFactor.*-1/);
  });
});

describe('physicalDiameter', () => {
  it('inverts aerodynamicDiameter at 0.05, 1 and 20 µm', () => {
    for (const d_m of [0.05e-6, 1e-6, 20e-6]) {
      expect(physicalDiameter(aerodynamicDiameter(d_m, 3900, 1.1), 3900, 1.1) / d_m).toBeCloseTo(1, 10);
    }
  });

  it('rejects a NaN aerodynamic diameter, naming the argument', () => {
    expect(() => physicalDiameter(NaN, 1000)).toThrow(/aerodynamicDiameter_m.*NaN/);
  });
});
