import { aerodynamicDiameter, conventionMassFraction, hatchChoate, normalCdf } from '../physics/index';
import type { MassBins } from './mass-bins';

export type LognormalInput = { basis: 'mmad' | 'cmd'; median_m: number; gsd: number; density_kgPerM3?: number; shapeFactor?: number };

// Approximate: Hatch–Choate gives the physical mass median (ln MMD = ln CMD + 3 ln²σg, Hinds Eq. 4.40);
// turning it into an aerodynamic one assumes σg survives the change of diameter, true only above ~1 µm where slip fades.
export function lognormalMmad(input: LognormalInput): number {
  if (input.basis === 'mmad') return input.median_m;
  const massMedian_m = hatchChoate(input.median_m, input.gsd).massMedian_m;
  return aerodynamicDiameter(massMedian_m, input.density_kgPerM3!, input.shapeFactor ?? 1);
}

const BINS = 40;
const SPAN_SIGMAS = 3.5;

// Log-spaced bins over MMAD·σg^±3.5 hold all but 0.05 % of the mass; the rest is folded into the end bins.
export function lognormalBins(mmad_m: number, gsd: number): MassBins {
  const lnGsd = Math.log(gsd);
  const edges_m = Array.from({ length: BINS + 1 }, (_, i) => mmad_m * Math.exp((-SPAN_SIGMAS + (2 * SPAN_SIGMAS * i) / BINS) * lnGsd));
  const z = edges_m.map((d) => Math.log(d / mmad_m) / lnGsd);
  const massFraction = z.slice(1).map((zHi, i) => (i === BINS - 1 ? 1 : normalCdf(zHi)) - (i === 0 ? 0 : normalCdf(z[i])));
  return { edges_m, massFraction };
}

export const DEFAULT_RESPIRABLE_GSD = 2;
const SEARCH_LOW_m = 1e-9;
const SEARCH_HIGH_m = 1e-3;

// Assumed shape: a lognormal of the given σg (2 unless told) whose ISO 7708 respirable mass fraction
// matches the one given. The respirable fraction falls as MMAD grows, so bisection in ln MMAD finds it.
export function mmadForRespirableFraction(respirable: number, gsd = DEFAULT_RESPIRABLE_GSD): number {
  let lo = Math.log(SEARCH_LOW_m);
  let hi = Math.log(SEARCH_HIGH_m);
  for (let i = 0; i < 48; i++) {
    const mid = 0.5 * (lo + hi);
    if (conventionMassFraction(Math.exp(mid), gsd, 'respirable') > respirable) lo = mid;
    else hi = mid;
  }
  return Math.exp(0.5 * (lo + hi));
}
