import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import { aerodynamicDiameter, physicalDiameter, settlingVelocity, slipCorrection, stokesSettlingVelocity } from './index';

const diameter_m = fc.double({ min: -8, max: Math.log10(300e-6), noNaN: true }).map((e) => 10 ** e);
const density_kgPerM3 = fc.double({ min: 100, max: 20000, noNaN: true });

describe('particle transport properties', () => {
  it('settling velocity grows with diameter', () => {
    fc.assert(
      fc.property(diameter_m, diameter_m, density_kgPerM3, (a, b, rho) => {
        fc.pre(Math.abs(a / b - 1) > 1e-9);
        const [small, large] = a < b ? [a, b] : [b, a];
        expect(settlingVelocity(small, rho)).toBeLessThan(settlingVelocity(large, rho));
      }),
    );
  });

  it('settling velocity grows with density', () => {
    fc.assert(
      fc.property(diameter_m, density_kgPerM3, density_kgPerM3, (d, a, b) => {
        fc.pre(Math.abs(a / b - 1) > 1e-9);
        const [light, heavy] = a < b ? [a, b] : [b, a];
        expect(settlingVelocity(d, light)).toBeLessThan(settlingVelocity(d, heavy));
      }),
    );
  });

  it('drag-corrected settling never exceeds Stokes settling', () => {
    fc.assert(
      fc.property(diameter_m, density_kgPerM3, (d, rho) => {
        expect(settlingVelocity(d, rho)).toBeLessThanOrEqual(stokesSettlingVelocity(d, rho) * (1 + 1e-12));
      }),
    );
  });

  it('slip correction exceeds 1, falls with diameter and tends to 1 for large particles', () => {
    fc.assert(
      fc.property(diameter_m, diameter_m, (a, b) => {
        fc.pre(Math.abs(a / b - 1) > 1e-9);
        const [small, large] = a < b ? [a, b] : [b, a];
        expect(slipCorrection(large)).toBeGreaterThan(1);
        expect(slipCorrection(small)).toBeGreaterThan(slipCorrection(large));
        expect(slipCorrection(large * 1e3) - 1).toBeLessThan((slipCorrection(large) - 1) * 2e-3);
      }),
    );
  });

  it('physicalDiameter undoes aerodynamicDiameter', () => {
    fc.assert(
      fc.property(diameter_m, density_kgPerM3, fc.double({ min: 1, max: 3, noNaN: true }), (d, rho, chi) => {
        expect(physicalDiameter(aerodynamicDiameter(d, rho, chi), rho, chi) / d).toBeCloseTo(1, 9);
      }),
    );
  });
});
