import type { Scenario } from '../../shared/schemas/scenario';
import {
  type AirProperties,
  diffusionCoefficient,
  inhalableFraction,
  physicalDiameter,
  respirableFraction,
  settlingVelocity,
  thoracicFraction,
} from '../../shared/physics/index';
import { profileShares } from './profile-shares';
import { SIZE_MAX_AERODYNAMIC_m, SIZE_MIN_PHYSICAL_m, binEdges_m } from './size-grid';
import { FRACTIONS, type SizeBins } from './types';

export { BINS_PER_DECADE, SIZE_MAX_AERODYNAMIC_m, SIZE_MIN_PHYSICAL_m, binEdges_m } from './size-grid';

type Dust = Scenario['dust'];

/** The ISO 7708 / EN 481 convention of each fraction (total takes every size). */
export const CONVENTIONS: Record<(typeof FRACTIONS)[number], (aerodynamic_m: number) => number> = {
  total: () => 1,
  inhalable: inhalableFraction,
  thoracic: thoracicFraction,
  respirable: respirableFraction,
};

// Defensive mixture: half the particles follow mass, half are spread evenly over bins that carry
// mass, so small respirable bins get particles even when coarse dust dominates the mass. With an
// emphasis (variance reduction: the limit fraction's convention weight per bin), half follow each
// bin's contribution to that fraction, a quarter mass and a quarter go evenly: each bin's particle
// mass changes with its count, so the estimate stays unbiased whatever the split.
export function allocateParticles(shares: Float64Array, particles: number, emphasis?: Float64Array): Int32Array {
  const relevant = shares.map((m) => (m > 1e-6 ? 1 : 0));
  const nRelevant = relevant.reduce((a, v) => a + v, 0);
  const weighted = emphasis ? shares.map((m, b) => (relevant[b] ? m * emphasis[b] : 0)) : undefined;
  const weightedSum = weighted ? weighted.reduce((a, v) => a + v, 0) : 0;
  const target = shares.map((m, b) =>
    weighted && weightedSum > 0
      ? particles * ((0.5 * weighted[b]) / weightedSum + 0.25 * m + (0.25 * relevant[b]) / nRelevant)
      : particles * (0.5 * m + (0.5 * relevant[b]) / nRelevant),
  );
  const counts = Int32Array.from(target, (v) => Math.floor(v));
  let left = particles - counts.reduce((a, v) => a + v, 0);
  const order = [...target.keys()].sort((a, b) => target[b] - Math.floor(target[b]) - (target[a] - Math.floor(target[a])) || a - b);
  for (const b of order) {
    if (left <= 0) break;
    counts[b] += 1;
    left -= 1;
  }
  return counts;
}

/**
 * Mass outside the simulated sizes is never renormalised into them: the particles carry only the
 * profile's share inside, (1 − left-out share) of the emission, so concentrations, fates (shares of
 * the whole emission) and cross-checks all speak of the same simulated mass, and the left-out share
 * travels to the result beside them; fates plus the left-out share make one.
 */
export function buildSizeBins(
  dust: Dust,
  air: AirProperties,
  particles: number,
  emitted_mg: number,
  eddy_m2PerS: number,
  emphasis?: (aerodynamic_m: number) => number,
): SizeBins {
  const edges = binEdges_m(dust, air);
  const { shares, below, above } = profileShares(dust, edges, air);
  const simulated = shares.reduce((a, m) => a + m, 0);
  if (!(simulated > 0))
    throw new RangeError(
      `dust.sizeProfile: no mass between 1 nm physical and 100 µm aerodynamic diameter, got ${below} below and ${above} above`,
    );
  const counts = allocateParticles(
    shares,
    particles,
    emphasis && Float64Array.from(shares, (_, b) => emphasis(Math.sqrt(edges[b] * edges[b + 1]))),
  );
  // Bins that got no particle (tiny runs only) give up their mass to the other simulated bins; the
  // cross-checks read profileMassFraction, which does not depend on this.
  const covered = shares.reduce((a, m, b) => a + (counts[b] > 0 ? m : 0), 0);
  const n = shares.length;
  const bins: SizeBins = {
    count: n,
    aerodynamic_m: new Float64Array(n),
    physical_m: new Float64Array(n),
    massFraction: new Float64Array(n),
    profileMassFraction: shares,
    settling_mPerS: new Float64Array(n),
    diffusivity_m2PerS: new Float64Array(n),
    brownianDiffusivity_m2PerS: new Float64Array(n),
    particleMass_mg: new Float64Array(n),
    particlesPerBatch: counts,
    conventionWeight: new Float64Array(FRACTIONS.length * n),
    massLeftOut: {
      share: below + above,
      below,
      above,
      lowerPhysical_m: SIZE_MIN_PHYSICAL_m,
      upperAerodynamic_m: SIZE_MAX_AERODYNAMIC_m,
    },
  };
  const conventions = FRACTIONS.map((f) => CONVENTIONS[f]);
  for (let b = 0; b < n; b++) {
    const da = Math.sqrt(edges[b] * edges[b + 1]);
    const dp = physicalDiameter(da, dust.density_kgPerM3, dust.shapeFactor, air);
    bins.aerodynamic_m[b] = da;
    bins.physical_m[b] = dp;
    bins.massFraction[b] = counts[b] > 0 ? (shares[b] * simulated) / covered : 0;
    // Settling of a unit-density sphere of diameter d_a is the aerodynamic diameter's definition,
    // so the shape factor enters through it; Brownian mobility divides by χ.
    bins.settling_mPerS[b] = settlingVelocity(da, 1000, air);
    bins.brownianDiffusivity_m2PerS[b] = diffusionCoefficient(dp, air) / dust.shapeFactor;
    bins.diffusivity_m2PerS[b] = eddy_m2PerS + bins.brownianDiffusivity_m2PerS[b];
    bins.particleMass_mg[b] = counts[b] > 0 ? (emitted_mg * bins.massFraction[b]) / counts[b] : 0;
    conventions.forEach((f, k) => (bins.conventionWeight[k * n + b] = f(da)));
  }
  return bins;
}
