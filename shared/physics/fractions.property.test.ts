import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import { conventionMassFraction, inhalableFraction, respirableFraction, thoracicFraction } from './index';

const diameter_m = fc.double({ min: 0, max: 200e-6, noNaN: true });
const conventions = [inhalableFraction, thoracicFraction, respirableFraction];

describe('ISO 7708 fraction properties', () => {
  it('every fraction lies in [0, 1] and falls with diameter', () => {
    fc.assert(
      fc.property(diameter_m, diameter_m, (a, b) => {
        const [small, large] = a < b ? [a, b] : [b, a];
        for (const fraction of conventions) {
          expect(fraction(large)).toBeGreaterThanOrEqual(0);
          expect(fraction(small)).toBeLessThanOrEqual(1);
          expect(fraction(large)).toBeLessThanOrEqual(fraction(small));
        }
      }),
    );
  });

  it('the respirable fraction never exceeds the thoracic, nor the thoracic the inhalable', () => {
    fc.assert(
      fc.property(diameter_m, (d) => {
        expect(respirableFraction(d)).toBeLessThanOrEqual(thoracicFraction(d));
        expect(thoracicFraction(d)).toBeLessThanOrEqual(inhalableFraction(d));
      }),
    );
  });

  it('lognormal mass fractions lie in [0, 1] and fall as the median grows', () => {
    const median_m = fc.double({ min: -7, max: -4, noNaN: true }).map((e) => 10 ** e);
    fc.assert(
      fc.property(median_m, median_m, fc.double({ min: 1, max: 4, noNaN: true }), (a, b, gsd) => {
        const [small, large] = a < b ? [a, b] : [b, a];
        for (const convention of ['inhalable', 'thoracic', 'respirable'] as const) {
          const fine = conventionMassFraction(small, gsd, convention);
          const coarse = conventionMassFraction(large, gsd, convention);
          expect(coarse).toBeGreaterThanOrEqual(0);
          expect(fine).toBeLessThanOrEqual(1 + 1e-12);
          expect(coarse).toBeLessThanOrEqual(fine + 1e-9);
        }
      }),
      { numRuns: 50 },
    );
  });
});
