import { describe, it, expect } from 'vitest';
import { aerodynamicDiameter, diffusionCoefficient, physicalDiameter, slipCorrection } from './index';

describe('the physics core from 1 nm', () => {
  it('gives Cc(1 nm) = 224.3 and Cc(10 nm) = 22.98 within 0.5 % ([S] Hinds App. A11)', () => {
    expect(Math.abs(slipCorrection(1e-9) / 224.332 - 1)).toBeLessThan(0.005);
    expect(Math.abs(slipCorrection(10e-9) / 22.976 - 1)).toBeLessThan(0.005);
  });

  it('gives Cc(20 nm) = 1 + Kn·(1.17 + 0.525·e^(−0.78/Kn)) with Kn = 6.6 ([C] Hinds Eq. 3.20; no table value at 20 nm checked)', () => {
    expect(slipCorrection(20e-9)).toBeCloseTo(1 + 6.6 * (1.17 + 0.525 * Math.exp(-0.78 / 6.6)), 6);
  });

  it('gives D(10 nm) = 5.4e-8 m²/s within 3 % ([M] Hinds Table 7.1) and D ∝ 1/d² in the free-molecular limit ([S] Hinds ch. 7)', () => {
    expect(Math.abs(diffusionCoefficient(10e-9) / 5.4e-8 - 1)).toBeLessThan(0.03);
    const slope = Math.log(diffusionCoefficient(2e-9) / diffusionCoefficient(1e-9)) / Math.log(2);
    expect(slope).toBeGreaterThan(-2.02);
    expect(slope).toBeLessThan(-1.9);
    expect(diffusionCoefficient(1e-9)).toBeGreaterThan(5e-6);
    expect(diffusionCoefficient(1e-9)).toBeLessThan(5.6e-6);
  });

  it('scales the aerodynamic diameter with ρ, not √ρ, in the free-molecular limit: d_a → d·ρ_p/ρ₀ ([M] Hinds ch. 3, from memory)', () => {
    expect(Math.abs(aerodynamicDiameter(1e-9, 2650) / 2.65e-9 - 1)).toBeLessThan(0.01);
    const at20 = aerodynamicDiameter(20e-9, 2650) / 20e-9;
    expect(at20).toBeGreaterThan(Math.sqrt(2.65));
    expect(at20).toBeLessThan(2.65);
  });

  it('inverts the aerodynamic diameter at 1, 10 and 20 nm (Hinds Eq. 3.26 form, bracketing root)', () => {
    for (const d_m of [1e-9, 10e-9, 20e-9]) {
      expect(physicalDiameter(aerodynamicDiameter(d_m, 5200, 1.2), 5200, 1.2) / d_m).toBeCloseTo(1, 9);
    }
  });
});
