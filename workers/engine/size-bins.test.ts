import { describe, expect, it } from 'vitest';
import { STANDARD_AIR, normalCdf, respirableFraction } from '../../shared/physics/index';
import { prepareTest } from './engine.test-helper';
import { SIZE_BIN_COUNT, binEdges_m, massShares } from './size-bins';

const dust = (sizeProfile: object) => ({ density_kgPerM3: 2650, shapeFactor: 1, sizeProfile }) as never;

describe('size bins', () => {
  it('are 36 log-spaced aerodynamic bins from 0.1 to 100 µm', () => {
    const e = binEdges_m();
    expect(e.length).toBe(SIZE_BIN_COUNT + 1);
    expect(e[0]).toBeCloseTo(0.1e-6, 15);
    expect(e[SIZE_BIN_COUNT]).toBeCloseTo(100e-6, 12);
  });

  it('give particle weights that sum to the emitted mass in every bin set-up', () => {
    const p = prepareTest({
      dust: { density_kgPerM3: 2650, sizeProfile: { kind: 'lognormal', basis: 'mmad', median_m: 12e-6, gsd: 2.4 } },
      run: { particles: 3000, batches: 3 },
    });
    const sum = p.bins.particleMass_mg.reduce((a, m, b) => a + m * p.bins.particlesPerBatch[b], 0);
    expect(sum).toBeCloseTo(p.emission.emitted_mg, 12);
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

  it('hold the lognormal mass below each edge, Φ(ln(d/MMAD)/ln σg) (Hinds ch. 4)', () => {
    const shares = massShares(dust({ kind: 'lognormal', basis: 'mmad', median_m: 5e-6, gsd: 2 }), binEdges_m(), STANDARD_AIR);
    const e = binEdges_m();
    const inRange = normalCdf(Math.log(e[SIZE_BIN_COUNT] / 5e-6) / Math.LN2) - normalCdf(Math.log(e[0] / 5e-6) / Math.LN2);
    let below = 0;
    for (let b = 0; b < SIZE_BIN_COUNT; b += 1) {
      below += shares[b];
      const expected = (normalCdf(Math.log(e[b + 1] / 5e-6) / Math.LN2) - normalCdf(Math.log(e[0] / 5e-6) / Math.LN2)) / inRange;
      expect(below).toBeCloseTo(expected, 10);
    }
  });

  it('convert counts to mass with d³ for count-basis bins', () => {
    const shares = massShares(
      dust({ kind: 'bins', basis: 'count', diameter: 'aerodynamic', edges_m: [1e-6, 1.2e-6, 10e-6, 12e-6], amounts: [1000, 0, 1] }),
      binEdges_m(),
      STANDARD_AIR,
    );
    const e = binEdges_m();
    const small = shares.reduce((a, m, b) => a + (e[b + 1] <= 2e-6 ? m : 0), 0);
    // 1000 particles near 1.1 µm against one near 11 µm: equal mass within the d³ of their mid-points.
    expect(small).toBeGreaterThan(0.4);
    expect(small).toBeLessThan(0.6);
  });
});
