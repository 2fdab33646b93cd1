import { describe, expect, it } from 'vitest';
import { conventionMassFraction, inhalableFraction, respirableFraction, thoracicFraction } from '../physics/index';
import { binFractions } from './bin-fractions';
import { lognormalBins } from './lognormal-input';

// [S] ISO 7708:1995 / Soderholm 1989 table (physics.md §6), ±0.5 percentage points.
const TABLE: [number, number, number][] = [
  [1, 97.1, 97.1],
  [4, 50.0, 89.0],
  [5, 30.0, 85.4],
  [10, 1.3, 50.0],
];

const narrow = (d_um: number) => ({ edges_m: [d_um * 0.999e-6, d_um * 1.001e-6], massFraction: [1] });

describe('ISO 7708 fractions of mass bins', () => {
  it.each(TABLE)('a narrow bin at %s µm gives respirable %s % and thoracic %s % ([S] ISO 7708 table)', (d_um, r, t) => {
    const f = binFractions(narrow(d_um));
    expect(Math.abs(100 * f.respirable - r)).toBeLessThanOrEqual(0.5);
    expect(Math.abs(100 * f.thoracic - t)).toBeLessThanOrEqual(0.5);
    expect(f.inhalable).toBeCloseTo(inhalableFraction(d_um * 1e-6), 6);
  });

  it('a narrow bin equals the convention curves at its midpoint to 1e-6 (from the definition)', () => {
    const f = binFractions(narrow(3));
    expect(f.respirable).toBeCloseTo(respirableFraction(3e-6), 6);
    expect(f.thoracic).toBeCloseTo(thoracicFraction(3e-6), 6);
  });

  it('bins of a lognormal give its mass fractions to 0.2 points (analytic lognormal integral)', () => {
    const f = binFractions(lognormalBins(5e-6, 2));
    expect(f.respirable).toBeCloseTo(conventionMassFraction(5e-6, 2, 'respirable'), 2);
    expect(f.thoracic).toBeCloseTo(conventionMassFraction(5e-6, 2, 'thoracic'), 2);
    expect(f.inhalable).toBeCloseTo(conventionMassFraction(5e-6, 2, 'inhalable'), 2);
  });

  it('counts nothing inhalable above 100 µm, splitting a bin that straddles it ([S] ISO 7708 defines E_I to 100 µm)', () => {
    const f = binFractions({ edges_m: [50e-6, 200e-6], massFraction: [1] });
    const below = Math.log(2) / Math.log(4);
    expect(f.inhalable).toBeGreaterThan(0.5 * below * 0.99);
    expect(f.inhalable).toBeLessThan(0.55 * below);
  });
});
