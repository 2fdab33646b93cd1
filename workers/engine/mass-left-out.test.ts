import { describe, expect, it } from 'vitest';
import { combineBatches } from './combine';
import { prepareTest, runAll } from './engine.test-helper';

// Unit density and χ = 1 make d_a = d_p at every size (Hinds Eq. 3.26), so the simulated range is
// 1 nm to 100 µm on the profile's own axis and the tails are plain standard-normal values.
const unitDust = (sizeProfile: object) => ({ dust: { density_kgPerM3: 1000, shapeFactor: 1, sizeProfile } });
const PHI_MINUS_1 = 0.158655; // Φ(−1), [S] standard normal table
const PHI_MINUS_2 = 0.0227501; // Φ(−2), [S] standard normal table

describe('mass outside 1 nm – 100 µm', () => {
  it('is left out on both sides as the lognormal CDF says: MMAD √(1 nm·100 µm), ln σg = ln(100 µm/MMAD)/2 gives Φ(−2) each', () => {
    const mmad = Math.sqrt(1e-9 * 100e-6);
    const gsd = Math.exp(Math.log(100e-6 / mmad) / 2);
    const p = prepareTest(unitDust({ kind: 'lognormal', basis: 'mmad', median_m: mmad, gsd }));
    expect(p.bins.massLeftOut.below).toBeCloseTo(PHI_MINUS_2, 6);
    expect(p.bins.massLeftOut.above).toBeCloseTo(PHI_MINUS_2, 6);
    expect(p.bins.massLeftOut.share).toBeCloseTo(2 * PHI_MINUS_2, 6);
    const simulated = p.bins.profileMassFraction.reduce((a, m) => a + m, 0);
    expect(simulated).toBeCloseTo(1 - 2 * PHI_MINUS_2, 6);
  });

  it('above 100 µm: MMAD 50 µm, σg 2 leaves Φ(−1) out and nothing below', () => {
    const p = prepareTest(unitDust({ kind: 'lognormal', basis: 'mmad', median_m: 50e-6, gsd: 2 }));
    expect(p.bins.massLeftOut.above).toBeCloseTo(PHI_MINUS_1, 6);
    expect(p.bins.massLeftOut.below).toBeLessThan(1e-12);
  });

  it('below 1 nm physical for a count-median profile: mass median 2 nm by Hatch–Choate, σg 2 leaves Φ(−1) out ([S] Hinds ch. 4)', () => {
    const cmd = 2e-9 / Math.exp(3 * Math.LN2 ** 2);
    const p = prepareTest(unitDust({ kind: 'lognormal', basis: 'cmd', median_m: cmd, gsd: 2 }));
    expect(p.bins.massLeftOut.below).toBeCloseTo(PHI_MINUS_1, 6);
    expect(p.bins.massLeftOut.above).toBeLessThan(1e-12);
  });

  it('takes the part of an input bin beyond 100 µm, spread log-uniformly: 50–200 µm leaves ln 2/ln 4 = ½ out (the stated rule, common practice)', () => {
    const p = prepareTest(unitDust({ kind: 'bins', basis: 'mass', diameter: 'aerodynamic', edges_m: [50e-6, 200e-6], amounts: [3] }));
    expect(p.bins.massLeftOut.above).toBeCloseTo(0.5, 12);
    expect(p.bins.massLeftOut.below).toBe(0);
  });

  it('reaches the result, where fates plus the left-out share make the whole emission', () => {
    const p = prepareTest({
      ...unitDust({ kind: 'lognormal', basis: 'mmad', median_m: 50e-6, gsd: 2 }),
      run: { particles: 200, batches: 2, seed: 5 },
    });
    const r = combineBatches(p, runAll(p));
    expect(r.massLeftOut).toEqual(p.bins.massLeftOut);
    expect(r.fate.emitted_mg).toBe(p.emission.emitted_mg);
    const fates = r.fate.captured + r.fate.settled + r.fate.exhausted + r.fate.airborne;
    expect(fates + r.massLeftOut!.share).toBeCloseTo(1, 9);
  });

  it('refuses a profile with nothing in range, quoting the tails', () => {
    expect(() => prepareTest(unitDust({ kind: 'lognormal', basis: 'mmad', median_m: 1e-3, gsd: 1 }))).toThrow(/no mass between.*above/);
  });
});
