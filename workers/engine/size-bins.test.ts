import { describe, expect, it } from 'vitest';
import { STANDARD_AIR, aerodynamicDiameter, conventionMassFraction, normalCdf, respirableFraction } from '../../shared/physics/index';
import { prepareTest } from './engine.test-helper';
import { profileShares } from './profile-shares';
import { BINS_PER_DECADE, binEdges_m } from './size-bins';

const dust = (sizeProfile: object, density_kgPerM3 = 2650) => ({ density_kgPerM3, shapeFactor: 1, sizeProfile }) as never;
const quartz = { density_kgPerM3: 2650, shapeFactor: 1 };

describe('size bins', () => {
  it('run from 1 nm physical to 100 µm aerodynamic, 12 per decade on the aerodynamic axis ([C] the layout in size-grid.ts)', () => {
    const unit = binEdges_m({ density_kgPerM3: 1000, shapeFactor: 1 }, STANDARD_AIR);
    // Unit-density spheres: d_a = d_p at every size (Hinds Eq. 3.26 with ρ = ρ₀, χ = 1), so five whole decades.
    expect(unit.length).toBe(5 * BINS_PER_DECADE + 1);
    expect(unit[0] / 1e-9).toBeCloseTo(1, 9);
    const e = binEdges_m(quartz, STANDARD_AIR);
    expect(e[0]).toBeCloseTo(aerodynamicDiameter(1e-9, 2650), 20);
    expect(e[e.length - 1]).toBeCloseTo(100e-6, 15);
    for (let i = 2; i < e.length; i++) expect(Math.log10(e[i] / e[i - 1])).toBeCloseTo(1 / 12, 12);
    // The bottom bin is between half and one and a half of a regular one.
    const bottom = Math.log10(e[1] / e[0]) * 12;
    expect(bottom).toBeGreaterThanOrEqual(0.5);
    expect(bottom).toBeLessThan(1.5);
  });

  it('keep the 0.1–100 µm edges of the earlier 36-bin grid, 0.1 µm·10^(k/12) ([C] engine 1.3.0 layout)', () => {
    const e = binEdges_m(quartz, STANDARD_AIR);
    const top = e.length - 1;
    for (let k = 0; k <= 36; k++) expect(e[top - 36 + k] / (0.1e-6 * 10 ** (k / 12))).toBeCloseTo(1, 12);
  });

  it('resolve the ISO 7708 respirable curve: binned respirable share of MMAD 3 µm, σg 1.5 within 1 % of the integral ([C] Simpson over the lognormal)', () => {
    const p = prepareTest({ dust: { density_kgPerM3: 2650, sizeProfile: { kind: 'lognormal', basis: 'mmad', median_m: 3e-6, gsd: 1.5 } } });
    const binned = p.bins.profileMassFraction.reduce((a, m, b) => a + m * respirableFraction(p.bins.aerodynamic_m[b]), 0);
    expect(Math.abs(binned / conventionMassFraction(3e-6, 1.5, 'respirable') - 1)).toBeLessThan(0.01);
  });

  it('give particle weights that sum to the simulated share of the emitted mass', () => {
    const p = prepareTest({
      dust: { density_kgPerM3: 2650, sizeProfile: { kind: 'lognormal', basis: 'mmad', median_m: 12e-6, gsd: 2.4 } },
      run: { particles: 3000, batches: 3 },
    });
    const sum = p.bins.particleMass_mg.reduce((a, m, b) => a + m * p.bins.particlesPerBatch[b], 0);
    expect(p.bins.massLeftOut.share).toBeGreaterThan(0.005);
    expect(sum).toBeCloseTo(p.emission.emitted_mg * (1 - p.bins.massLeftOut.share), 12);
  });

  it('with variance reduction, give the limit’s fraction half the particles (by its share of each bin’s mass) without changing the emitted mass', () => {
    const coarse = {
      dust: { density_kgPerM3: 2650, sizeProfile: { kind: 'lognormal', basis: 'mmad', median_m: 20e-6, gsd: 2.2 } },
      limit: { fraction: 'respirable', value_mgPerM3: 0.025 },
    } as const;
    const respirableParticles = (varianceReduction: boolean) => {
      const p = prepareTest({ ...coarse, run: { particles: 6000, batches: 3, varianceReduction } });
      const sum = p.bins.particleMass_mg.reduce((a, m, b) => a + m * p.bins.particlesPerBatch[b], 0);
      expect(sum).toBeCloseTo(p.emission.emitted_mg * (1 - p.bins.massLeftOut.share), 12);
      return Array.from(p.bins.particlesPerBatch).reduce((a, n, b) => a + n * respirableFraction(p.bins.aerodynamic_m[b]), 0);
    };
    // Half the batch follows m·f_resp, where the plain allocation gives half to mass, which coarse dust
    // holds outside the respirable sizes (both spread part evenly, so the gain is well short of 2×).
    expect(respirableParticles(true)).toBeGreaterThan(1.3 * respirableParticles(false));
  });

  it('do not starve the respirable bins when coarse dust carries the mass', () => {
    const p = prepareTest({
      dust: { density_kgPerM3: 2650, sizeProfile: { kind: 'lognormal', basis: 'mmad', median_m: 30e-6, gsd: 2 } },
      run: { particles: 3000, batches: 3 },
    });
    const respirableParticles = Array.from(p.bins.particlesPerBatch).reduce(
      (a, n, b) => a + n * respirableFraction(p.bins.aerodynamic_m[b]),
      0,
    );
    const respirableMass = Array.from(p.bins.massFraction).reduce((a, m, b) => a + m * respirableFraction(p.bins.aerodynamic_m[b]), 0);
    expect(respirableParticles / 1000).toBeGreaterThan(5 * respirableMass);
  });

  it('hold the lognormal mass below each edge, Φ(ln(d/MMAD)/ln σg) − Φ(ln(d₀/MMAD)/ln σg), not renormalised (Hinds ch. 4)', () => {
    const e = binEdges_m(quartz, STANDARD_AIR);
    const { shares } = profileShares(dust({ kind: 'lognormal', basis: 'mmad', median_m: 5e-6, gsd: 2 }), e, STANDARD_AIR);
    const cdf = (d: number) => normalCdf(Math.log(d / 5e-6) / Math.LN2);
    let below = 0;
    for (let b = 0; b < shares.length; b += 1) {
      below += shares[b];
      expect(below).toBeCloseTo(cdf(e[b + 1]) - cdf(e[0]), 10);
    }
  });

  it('convert counts to mass with d³ for count-basis bins', () => {
    const e = binEdges_m(quartz, STANDARD_AIR);
    const { shares } = profileShares(
      dust({ kind: 'bins', basis: 'count', diameter: 'aerodynamic', edges_m: [1e-6, 1.2e-6, 10e-6, 12e-6], amounts: [1000, 0, 1] }),
      e,
      STANDARD_AIR,
    );
    const small = shares.reduce((a, m, b) => a + (e[b + 1] <= 2e-6 ? m : 0), 0);
    // 1000 particles near 1.1 µm against one near 11 µm: equal mass within the d³ of their mid-points.
    expect(small).toBeGreaterThan(0.4);
    expect(small).toBeLessThan(0.6);
  });
});
