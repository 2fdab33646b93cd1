import { describe, it, expect } from 'vitest';
import { conventionMassFraction, hatchChoate, respirableFraction, thoracicFraction, inhalableFraction } from './index';

// Independent check: trapezoid over d itself (not ln d) of E(d)·(mass lognormal density in d).
function trapezoidOverDiameter(mmad_m: number, gsd: number, fraction: (d_m: number) => number): number {
  const lnGsd = Math.log(gsd);
  const density = (d: number) => Math.exp(-0.5 * (Math.log(d / mmad_m) / lnGsd) ** 2) / (d * lnGsd * Math.sqrt(2 * Math.PI));
  const upper_m = Math.min(mmad_m * gsd ** 8, 2e-4);
  const steps = 200000;
  const h = upper_m / steps;
  let sum = 0;
  for (let i = 1; i <= steps; i++) {
    const d = i * h;
    const y = fraction(d) * density(d);
    sum += i === steps ? y / 2 : y;
  }
  return sum * h;
}

describe('hatchChoate', () => {
  it('shifts ln CMD by 3, 2, 1.5, 2.5 and 0.5 times (ln σg)² ([S] Hinds Ch. 4 Hatch–Choate)', () => {
    const lnSq = Math.log(2) ** 2;
    const result = hatchChoate(1e-6, 2);
    expect(result.massMedian_m).toBeCloseTo(1e-6 * Math.exp(3 * lnSq), 15);
    expect(result.surfaceMedian_m).toBeCloseTo(1e-6 * Math.exp(2 * lnSq), 15);
    expect(result.averageMass_m).toBeCloseTo(1e-6 * Math.exp(1.5 * lnSq), 15);
    expect(result.sauter_m).toBeCloseTo(1e-6 * Math.exp(2.5 * lnSq), 15);
    expect(result.numberMean_m).toBeCloseTo(1e-6 * Math.exp(0.5 * lnSq), 15);
  });

  it('turns CMD 1 µm, σg 2 into an MMD of about 4.226 µm ([C])', () => {
    expect(hatchChoate(1e-6, 2).massMedian_m * 1e6).toBeCloseTo(4.226, 3);
  });

  it('collapses every diameter onto the CMD for a monodisperse aerosol', () => {
    const result = hatchChoate(3e-6, 1);
    for (const value of Object.values(result)) expect(value).toBe(3e-6);
  });

  it('rejects a GSD below 1, quoting it', () => {
    expect(() => hatchChoate(1e-6, 0.8)).toThrow(/gsd.*0\.8/);
  });
});

describe('conventionMassFraction', () => {
  it.each([
    [2e-6, 1.5, 'respirable', respirableFraction],
    [5e-6, 2.5, 'respirable', respirableFraction],
    [10e-6, 2, 'thoracic', thoracicFraction],
    [3e-6, 3, 'thoracic', thoracicFraction],
    [20e-6, 2, 'inhalable', inhalableFraction],
  ] as const)('matches an independent trapezoid over d for MMAD %s m, GSD %s, %s', (mmad_m, gsd, convention, fraction) => {
    const expected = trapezoidOverDiameter(mmad_m, gsd, fraction);
    expect(Math.abs(conventionMassFraction(mmad_m, gsd, convention) - expected)).toBeLessThan(2e-4);
  });

  it('gives the respirable curve itself for a monodisperse aerosol', () => {
    expect(conventionMassFraction(4e-6, 1, 'respirable')).toBe(respirableFraction(4e-6));
  });

  it('finds respirable mass in the fine tail of a wide coarse dust that a narrow one lacks', () => {
    expect(conventionMassFraction(20e-6, 1.2, 'respirable')).toBeLessThan(1e-3);
    expect(conventionMassFraction(20e-6, 3, 'respirable')).toBeGreaterThan(0.05);
  });

  it('rejects an unknown convention, quoting it', () => {
    // @ts-expect-error the type forbids it; the runtime check guards untyped callers
    expect(() => conventionMassFraction(4e-6, 2, 'nasal')).toThrow(/nasal/);
  });
});
