import type { Scenario } from '../../shared/schemas/scenario';
import {
  type AirProperties,
  aerodynamicDiameter,
  diffusionCoefficient,
  hatchChoate,
  inhalableFraction,
  normalCdf,
  physicalDiameter,
  respirableFraction,
  settlingVelocity,
  thoracicFraction,
} from '../../shared/physics/index';
import { FRACTIONS, type SizeBins } from './types';

// 36 log-spaced aerodynamic bins over 0.1–100 µm (12 per decade, ratio 1.21): the respirable curve's
// width ln 1.5 spans two bins, enough to resolve ISO 7708; mass outside the range is not simulated.
export const SIZE_BIN_COUNT = 36;
export const SIZE_MIN_m = 0.1e-6;
export const SIZE_MAX_m = 100e-6;

export function binEdges_m(): Float64Array {
  const edges = new Float64Array(SIZE_BIN_COUNT + 1);
  const ratio = Math.log(SIZE_MAX_m / SIZE_MIN_m) / SIZE_BIN_COUNT;
  for (let i = 0; i <= SIZE_BIN_COUNT; i++) edges[i] = SIZE_MIN_m * Math.exp(i * ratio);
  return edges;
}

type Dust = Scenario['dust'];

function lognormalShare(lo_m: number, hi_m: number, median_m: number, gsd: number): number {
  if (gsd === 1) return median_m >= lo_m && median_m < hi_m ? 1 : 0;
  const s = Math.log(gsd);
  return normalCdf(Math.log(hi_m / median_m) / s) - normalCdf(Math.log(lo_m / median_m) / s);
}

function overlapShare(lo: number, hi: number, binLo: number, binHi: number): number {
  const a = Math.max(lo, binLo);
  const b = Math.min(hi, binHi);
  return b > a ? Math.log(b / a) / Math.log(hi / lo) : 0;
}

// Mass share per engine bin; input bins spread their mass log-uniformly over their width.
export function massShares(dust: Dust, edges_m: Float64Array, air: AirProperties): Float64Array {
  const { density_kgPerM3: rho, shapeFactor: chi, sizeProfile: p } = dust;
  const toAero = (d: number) => aerodynamicDiameter(d, rho, chi, air);
  const toPhys = (d: number) => physicalDiameter(d, rho, chi, air);
  const shares = new Float64Array(SIZE_BIN_COUNT);
  for (let b = 0; b < SIZE_BIN_COUNT; b++) {
    const lo = edges_m[b];
    const hi = edges_m[b + 1];
    if (p.kind === 'lognormal') {
      shares[b] =
        p.basis === 'mmad'
          ? lognormalShare(lo, hi, p.median_m, p.gsd)
          : lognormalShare(toPhys(lo), toPhys(hi), hatchChoate(p.median_m, p.gsd).massMedian_m, p.gsd);
      continue;
    }
    for (let i = 0; i < p.amounts.length; i++) {
      let inLo = p.edges_m[i];
      let inHi = p.edges_m[i + 1];
      const midPhys = p.diameter === 'physical' ? Math.sqrt(inLo * inHi) : toPhys(Math.sqrt(inLo * inHi));
      const mass = p.basis === 'mass' ? p.amounts[i] : p.amounts[i] * rho * (Math.PI / 6) * midPhys ** 3;
      if (p.diameter === 'physical') {
        inLo = toAero(inLo);
        inHi = toAero(inHi);
      }
      shares[b] += mass * overlapShare(inLo, inHi, lo, hi);
    }
  }
  const total = shares.reduce((a, v) => a + v, 0);
  if (!(total > 0)) throw new RangeError('dust.sizeProfile: no mass between 0.1 and 100 µm aerodynamic diameter');
  for (let b = 0; b < SIZE_BIN_COUNT; b++) shares[b] /= total;
  return shares;
}

// Defensive mixture: half the particles follow mass, half are spread evenly over bins that carry
// mass, so small respirable bins get particles even when coarse dust dominates the mass.
export function allocateParticles(shares: Float64Array, particles: number): Int32Array {
  const relevant = shares.map((m) => (m > 1e-6 ? 1 : 0));
  const nRelevant = relevant.reduce((a, v) => a + v, 0);
  const target = shares.map((m, b) => particles * (0.5 * m + (0.5 * relevant[b]) / nRelevant));
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

export function buildSizeBins(dust: Dust, air: AirProperties, particles: number, emitted_mg: number, eddy_m2PerS: number): SizeBins {
  const edges = binEdges_m();
  const shares = massShares(dust, edges, air);
  const counts = allocateParticles(shares, particles);
  // Bins that got no particle (tiny runs only) give up their mass to the others.
  const covered = shares.reduce((a, m, b) => a + (counts[b] > 0 ? m : 0), 0);
  const n = SIZE_BIN_COUNT;
  const bins: SizeBins = {
    count: n,
    aerodynamic_m: new Float64Array(n),
    physical_m: new Float64Array(n),
    massFraction: new Float64Array(n),
    settling_mPerS: new Float64Array(n),
    diffusivity_m2PerS: new Float64Array(n),
    brownianDiffusivity_m2PerS: new Float64Array(n),
    particleMass_mg: new Float64Array(n),
    particlesPerBatch: counts,
    conventionWeight: new Float64Array(FRACTIONS.length * n),
  };
  const conventions = [() => 1, inhalableFraction, thoracicFraction, respirableFraction];
  for (let b = 0; b < n; b++) {
    const da = Math.sqrt(edges[b] * edges[b + 1]);
    const dp = physicalDiameter(da, dust.density_kgPerM3, dust.shapeFactor, air);
    bins.aerodynamic_m[b] = da;
    bins.physical_m[b] = dp;
    bins.massFraction[b] = counts[b] > 0 ? shares[b] / covered : 0;
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
