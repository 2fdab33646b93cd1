import type { Scenario } from '../../shared/schemas/scenario';
import {
  type AirProperties,
  aerodynamicDiameter,
  hatchChoate,
  massOutsideRange,
  normalCdf,
  physicalDiameter,
} from '../../shared/physics/index';
import { log } from '../../shared/det-math/index';

type Dust = Scenario['dust'];

export interface ProfileShares {
  /** Share of the profile's mass in each bin, not renormalised: with the two tails it sums to one. */
  shares: Float64Array;
  /** Share below the bottom edge (1 nm physical) and above the top edge (100 µm aerodynamic). */
  below: number;
  above: number;
}

function lognormalShare(lo_m: number, hi_m: number, median_m: number, gsd: number, top: boolean): number {
  // A one-size profile sitting exactly on the top edge still belongs to the last bin, as massOutsideRange counts it in.
  if (gsd === 1) return median_m >= lo_m && (median_m < hi_m || (top && median_m === hi_m)) ? 1 : 0;
  const s = log(gsd);
  return normalCdf(log(hi_m / median_m) / s) - normalCdf(log(lo_m / median_m) / s);
}

function overlapShare(lo: number, hi: number, binLo: number, binHi: number): number {
  const a = Math.max(lo, binLo);
  const b = Math.min(hi, binHi);
  return b > a ? log(b / a) / log(hi / lo) : 0;
}

/**
 * Mass share per engine bin (aerodynamic edges) and the tails outside them. A lognormal's tails are
 * its CDF beyond the end edges (massOutsideRange); input bins spread their mass log-uniformly over
 * their width, so a bin that straddles an end edge leaves out the part beyond it.
 */
export function profileShares(dust: Dust, edges_m: Float64Array, air: AirProperties): ProfileShares {
  const { density_kgPerM3: rho, shapeFactor: chi, sizeProfile: p } = dust;
  const toAero = (d: number) => aerodynamicDiameter(d, rho, chi, air);
  const toPhys = (d: number) => physicalDiameter(d, rho, chi, air);
  const n = edges_m.length - 1;
  const lower_m = edges_m[0];
  const upper_m = edges_m[n];
  const shares = new Float64Array(n);
  if (p.kind === 'lognormal') {
    const aero = p.basis === 'mmad';
    // A count-median profile is physical: its mass median by Hatch–Choate, compared on physical edges.
    const median_m = aero ? p.median_m : hatchChoate(p.median_m, p.gsd).massMedian_m;
    const edge = (i: number) => (aero ? edges_m[i] : toPhys(edges_m[i]));
    for (let b = 0; b < n; b++) shares[b] = lognormalShare(edge(b), edge(b + 1), median_m, p.gsd, b === n - 1);
    const out = massOutsideRange(median_m, p.gsd, edge(0), edge(n));
    return { shares, below: out.below, above: out.above };
  }
  let total = 0;
  let below = 0;
  let above = 0;
  for (let i = 0; i < p.amounts.length; i++) {
    let inLo = p.edges_m[i];
    let inHi = p.edges_m[i + 1];
    const midPhys = p.diameter === 'physical' ? Math.sqrt(inLo * inHi) : toPhys(Math.sqrt(inLo * inHi));
    const mass = p.basis === 'mass' ? p.amounts[i] : p.amounts[i] * rho * (Math.PI / 6) * midPhys * midPhys * midPhys;
    if (p.diameter === 'physical') {
      inLo = toAero(inLo);
      inHi = toAero(inHi);
    }
    total += mass;
    below += mass * overlapShare(inLo, inHi, 0.5 * Math.min(inLo, lower_m), lower_m);
    above += mass * overlapShare(inLo, inHi, upper_m, 2 * Math.max(inHi, upper_m));
    for (let b = 0; b < n; b++) shares[b] += mass * overlapShare(inLo, inHi, edges_m[b], edges_m[b + 1]);
  }
  if (!(total > 0)) throw new RangeError(`dust.sizeProfile: amounts must carry some mass, got a total of ${total}`);
  for (let b = 0; b < n; b++) shares[b] /= total;
  return { shares, below: below / total, above: above / total };
}
