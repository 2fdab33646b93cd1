import { inhalableFraction, respirableFraction, thoracicFraction } from '../physics/index';
import type { MassBins } from './mass-bins';

export type ConventionFractions = { respirable: number; thoracic: number; inhalable: number };

const PANELS = 32;
// ISO 7708 stops the inhalable curve at 100 µm; integrating across the step would blur it.
const INHALABLE_END_m = 100e-6;

// Composite Simpson in ln d: mass spreads log-uniformly over a bin, as the engine assumes too.
function meanOverLogRange(f: (d_m: number) => number, lo_m: number, hi_m: number): number {
  const a = Math.log(lo_m);
  const h = (Math.log(hi_m) - a) / PANELS;
  let sum = 0;
  for (let i = 0; i <= PANELS; i++) {
    const weight = i === 0 || i === PANELS ? 1 : i % 2 === 1 ? 4 : 2;
    sum += weight * f(Math.exp(a + i * h));
  }
  return sum / (3 * PANELS);
}

// Mean of an ISO 7708 convention over [lo, hi] in ln d, split at 100 µm.
export function binConventionMean(f: (d_m: number) => number, lo_m: number, hi_m: number): number {
  if (lo_m >= INHALABLE_END_m || hi_m <= INHALABLE_END_m) return meanOverLogRange(f, lo_m, hi_m);
  const below = Math.log(INHALABLE_END_m / lo_m);
  const above = Math.log(hi_m / INHALABLE_END_m);
  return (
    (below * meanOverLogRange(f, lo_m, INHALABLE_END_m * (1 - 1e-12)) + above * meanOverLogRange(f, INHALABLE_END_m * (1 + 1e-12), hi_m)) /
    (below + above)
  );
}

export function binFractions(bins: MassBins): ConventionFractions {
  const total = (f: (d_m: number) => number) =>
    Math.min(
      1,
      bins.massFraction.reduce((a, m, i) => (m > 0 ? a + m * binConventionMean(f, bins.edges_m[i], bins.edges_m[i + 1]) : a), 0),
    );
  return { respirable: total(respirableFraction), thoracic: total(thoracicFraction), inhalable: total(inhalableFraction) };
}
