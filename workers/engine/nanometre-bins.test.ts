import { describe, expect, it } from 'vitest';
import { STANDARD_AIR, hatchChoate, physicalDiameter } from '../../shared/physics/index';
import { onlyBin, prepareTest } from './engine.test-helper';
import { binEdges_m } from './size-grid';

// Stokes–Einstein with slip written out (Hinds Eq. 7.7 with Eq. 3.20): k_B = 1.380649e-23 J/K,
// T = 293.15 K, μ = 1.81e-5 Pa·s and λ = 0.066 µm ([S] Hinds App. A4), A, B, C = 1.17, 0.525, 0.78.
function stokesEinsteinCunningham(d_m: number): number {
  const kn = (2 * 0.066e-6) / d_m;
  const cc = 1 + kn * (1.17 + 0.525 * Math.exp(-0.78 / kn));
  return (1.380649e-23 * 293.15 * cc) / (3 * Math.PI * 1.81e-5 * d_m);
}

const fume = (gsd: number, shapeFactor = 1) =>
  prepareTest({
    dust: { density_kgPerM3: 5200, shapeFactor, sizeProfile: { kind: 'lognormal', basis: 'cmd', median_m: 20e-9, gsd } },
    run: { particles: 2000, batches: 2 },
  });

describe('a 20 nm fume', () => {
  it('is simulated at 20 nm with the Stokes–Einstein–Cunningham diffusivity there, nothing left out ([C] Hinds Eq. 7.7)', () => {
    const p = fume(1);
    const b = onlyBin(p);
    const edges = binEdges_m({ density_kgPerM3: 5200, shapeFactor: 1 }, STANDARD_AIR);
    const lo = physicalDiameter(edges[b], 5200, 1);
    const hi = physicalDiameter(edges[b + 1], 5200, 1);
    expect(lo).toBeLessThanOrEqual(20e-9);
    expect(hi).toBeGreaterThan(20e-9);
    expect(p.bins.particlesPerBatch[b]).toBe(p.particlesPerBatch);
    // The bin's own diameter, and 20 nm itself within the bin's half width (D ∝ d^−1.6 to d^−2 here).
    expect(p.bins.brownianDiffusivity_m2PerS[b] / stokesEinsteinCunningham(p.bins.physical_m[b])).toBeCloseTo(1, 2);
    expect(Math.abs(Math.log(p.bins.brownianDiffusivity_m2PerS[b] / stokesEinsteinCunningham(20e-9)))).toBeLessThan(2 * Math.log(hi / lo));
    expect(p.bins.diffusivity_m2PerS[b]).toBeCloseTo(p.eddyDiffusivity_m2PerS + p.bins.brownianDiffusivity_m2PerS[b], 15);
    expect(p.bins.massLeftOut).toMatchObject({ share: 0, below: 0, above: 0 });
  });

  it('divides the Brownian diffusivity by the shape factor (mobility ∝ 1/χ, Hinds ch. 3, from memory)', () => {
    const p = fume(1, 1.5);
    const b = onlyBin(p);
    expect((1.5 * p.bins.brownianDiffusivity_m2PerS[b]) / stokesEinsteinCunningham(p.bins.physical_m[b])).toBeCloseTo(1, 2);
  });

  it('with σg = 1.6 keeps its mass around the Hatch–Choate mass median and leaves Φ(−7.8) ≈ 3e-15 out ([S] Hinds ch. 4)', () => {
    const p = fume(1.6);
    expect(p.bins.massLeftOut.share).toBeLessThan(1e-12);
    const { massMedian_m } = hatchChoate(20e-9, 1.6);
    let cumulative = 0;
    let median = -1;
    for (let b = 0; b < p.bins.count && median < 0; b++) {
      cumulative += p.bins.profileMassFraction[b];
      if (cumulative >= 0.5) median = b;
    }
    expect(Math.abs(Math.log10(p.bins.physical_m[median] / massMedian_m))).toBeLessThan(1.5 / 12);
  });
});
