import { describe, expect, it } from 'vitest';
import { normalCdf } from '../physics/index';
import { fitLognormal } from './fit-lognormal';
import { lognormalBins } from './lognormal-input';

// Bins of a known lognormal: mass between edges is Φ(ln(d_hi/MMAD)/ln σg) − Φ(ln(d_lo/MMAD)/ln σg) (analytic).
function analyticBins(mmad_m: number, gsd: number, edges_um: number[]) {
  const edges_m = edges_um.map((d) => d * 1e-6);
  const F = edges_m.map((d) => normalCdf(Math.log(d / mmad_m) / Math.log(gsd)));
  const massFraction = F.slice(1).map((f, i) => f - F[i]);
  const total = F[F.length - 1] - F[0];
  return { edges_m, massFraction: massFraction.map((m) => m / total) };
}

describe('fitLognormal', () => {
  it('fits bins drawn from MMAD 5 µm, GSD 2 back within 2 % on both (analytic)', () => {
    const bins = analyticBins(5e-6, 2, [0.1, 0.5, 1, 2, 4, 8, 16, 32, 64, 1000]);
    const fit = fitLognormal(bins)!;
    expect(Math.abs(fit.mmad_m / 5e-6 - 1)).toBeLessThan(0.02);
    expect(Math.abs(fit.gsd / 2 - 1)).toBeLessThan(0.02);
  });

  it('recovers a lognormal from its own 40 generated bins almost exactly (analytic)', () => {
    const fit = fitLognormal(lognormalBins(2.5e-6, 1.8))!;
    expect(fit.mmad_m).toBeCloseTo(2.5e-6, 10);
    expect(fit.gsd).toBeCloseTo(1.8, 6);
  });

  it('gives no fit when all the mass sits in one bin (common practice: two points make a line)', () => {
    expect(fitLognormal({ edges_m: [1e-6, 2e-6, 4e-6], massFraction: [1, 0] })).toBeNull();
  });

  it('uses the points inside the 0.1 %–99.9 % band when at least two lie there (from memory)', () => {
    const bins = analyticBins(3e-6, 1.5, [0.01, 2, 3, 4.5, 1000]);
    const fit = fitLognormal(bins)!;
    expect(fit.mmad_m).toBeCloseTo(3e-6, 9);
    expect(fit.gsd).toBeCloseTo(1.5, 3);
  });
});
