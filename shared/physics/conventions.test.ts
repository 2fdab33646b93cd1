import { describe, it, expect } from 'vitest';
import { inhalableFraction, respirableFraction, thoracicFraction } from './index';

// [S] Soderholm 1989, Ann. Occup. Hyg. 33:301; ISO 7708:1995 tables, ±0.5 percentage points.
const ISO_7708_TABLE: [number, number, number][] = [
  [1, 97.1, 97.1],
  [2, 91.4, 94.3],
  [3, 73.9, 91.7],
  [4, 50.0, 89.0],
  [5, 30.0, 85.4],
  [6, 16.8, 80.5],
  [7, 9.0, 74.2],
  [8, 4.8, 66.6],
  [10, 1.3, 50.0],
];

describe('ISO 7708 respirable and thoracic conventions', () => {
  it.each(ISO_7708_TABLE)(
    'at %s µm give respirable %s % and thoracic %s % within ±0.5 points ([S] ISO 7708; Soderholm 1989)',
    (d_um, respirable_pct, thoracic_pct) => {
      expect(Math.abs(100 * respirableFraction(d_um * 1e-6) - respirable_pct)).toBeLessThanOrEqual(0.5);
      expect(Math.abs(100 * thoracicFraction(d_um * 1e-6) - thoracic_pct)).toBeLessThanOrEqual(0.5);
    },
  );

  it('puts the respirable 50 % point at 4 µm and the thoracic one at 10 µm ([S] ISO 7708)', () => {
    expect(respirableFraction(4e-6)).toBeCloseTo(0.5, 2);
    expect(thoracicFraction(10e-6)).toBeCloseTo(0.5, 2);
  });

  it('lets every particle through at zero diameter', () => {
    expect(respirableFraction(0)).toBe(1);
    expect(thoracicFraction(0)).toBe(1);
  });
});

describe('inhalableFraction', () => {
  it('is 0.5·(1 + e^(−0.06 d)): 77.4 % at 10 µm and 50.1 % at 100 µm ([S] ISO 7708; [C])', () => {
    expect(inhalableFraction(10e-6)).toBeCloseTo(0.5 * (1 + Math.exp(-0.6)), 12);
    expect(100 * inhalableFraction(10e-6)).toBeCloseTo(77.4, 1);
    expect(inhalableFraction(100e-6)).toBeCloseTo(0.50124, 5);
  });

  it('counts nothing above 100 µm, where the convention is undefined', () => {
    expect(inhalableFraction(100.001e-6)).toBe(0);
    expect(thoracicFraction(150e-6)).toBe(0);
    expect(respirableFraction(1e-3)).toBe(0);
  });

  it('rejects a negative diameter, naming the argument', () => {
    expect(() => inhalableFraction(-1e-6)).toThrow(/d_m.*-0.000001/);
    expect(() => respirableFraction(NaN)).toThrow(/d_m.*NaN/);
  });
});
