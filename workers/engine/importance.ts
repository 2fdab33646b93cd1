import type { Kernel } from './kernel';
import { log } from '../../shared/det-math/index';

/**
 * Variance reduction (run.varianceReduction): a weight window over an importance map, so the
 * particle-steps go where they change the breathing-zone estimate.
 *
 * The map has tiers: nested shells around the breathing zone, spaced by halving the gap between the
 * zone's surface and the source (tier 1 holds the source; tier 0, far beyond it, is out of reach, see FAR_GAPS). A tier's
 * target weight is 2^−(tier−1), and a quarter of that again while the particle is deep in a hood's
 * capture region (deep), where it is about to be captured. When a particle's tier or deep flag
 * changes and its weight has left [target/1.5, 1.5·target], it is split into round(w/target) copies
 * of equal weight, or played at Russian roulette: it survives with probability w/target and then
 * carries the target weight. Both keep every tally's expectation (Kahn & Harris 1951; Booth 1985,
 * "A sample problem for variance reduction in MCNP"), whatever the map: the map only decides
 * where the work goes. Every copy carries its source particle's id, so a source history reaches the
 * zone once however often it was split.
 *
 * Thresholds carry hysteresis (a shell is left 30 % beyond where it was entered), so a particle that
 * wanders along a shell is not split and killed at every step.
 */
export interface ImportancePlan {
  enabled: boolean;
  /** Per tier: squared distance from the zone centre below which the particle moves one tier in. */
  inward2: Float64Array;
  /** Per tier: squared distance above which it moves one tier out. */
  outward2: Float64Array;
  /** Per tier: the target weight, 2^−(tier−1). */
  target: Float64Array;
  /** Deep in a capture region: within nearFace_m of a face and drift over that distance beats diffusion pecletIn to 1. */
  nearFace_m: number;
  leaveFace_m: number;
  pecletIn: number;
  pecletOut: number;
  /** Target weight multiplier while deep. */
  deepFactor: number;
}

// Shells down to 4 cm from the zone's surface: nearer than that the step rule's floor is reached.
const INNERMOST_GAP_m = 0.04;
// One shell inside the source's: measured on the demos (npm run bench), more shells split dust that
// reaches the zone anyway (a quarter of the default demo's histories do) and cost more steps than
// the variance they save; the share of the limit's fraction in the size allocation did most.
// (20,000 particles in 100 batches, figure of merit against the plain walk: no inner shell 1.8×,
// 1.2×, 1.2× on the default demo, the stone bench without a hood and the joinery side hood; one
// shell 2.2×, 0.95×, 0.9×; each figure is good to about ±25 %.)
const MAX_INNER_TIERS = 1;
const HYSTERESIS = 1.3;
// Tier 0 (roulette for dust far beyond the source) is kept in the map but out of reach: measured on
// the stone bench without a hood it cut the figure of merit to 0.4× at four source gaps, because the
// far dust is the room background that reaches the zone, and thinning it out only adds noise.
const FAR_GAPS = Infinity;
// Deep in a capture region: within 0.3 m of a face (where the default demo's walk spent a fifth of
// its steps) with the hood's drift over that distance beating diffusion 20 to 1; left at 0.45 m or 10 to 1.
const NEAR_FACE_m = 0.3;
const HYSTERESIS_FACE = 1.5;
const PECLET_IN = 20;
const DEEP_FACTOR = 4;
// Common practice in weight windows: a factor 1.5 either side of the target before acting.
export const WINDOW = 1.5;
export const REWEIGHT = -2;

// 2^k by repeated doubling or halving (exact), not **, whose result the language leaves to each engine.
function pow2(k: number): number {
  let v = 1;
  for (let j = 0; j < k; j++) v *= 2;
  for (let j = 0; j > k; j--) v /= 2;
  return v;
}

/** The plan for a scenario; sourceGap_m is the distance from the source to the zone's surface. */
export function importancePlan(
  enabled: boolean,
  zoneRadius_m: number,
  sourceGap_m: number,
  hoods: number,
): ImportancePlan & { tiers: number } {
  const gap = Math.max(sourceGap_m, INNERMOST_GAP_m);
  let inner = 0;
  while (inner < MAX_INNER_TIERS && gap / pow2(inner + 1) >= INNERMOST_GAP_m) inner++;
  const tiers = inner + 2;
  const inward2 = new Float64Array(tiers);
  const outward2 = new Float64Array(tiers);
  const target = new Float64Array(tiers);
  const R = zoneRadius_m;
  const sq = (v: number) => v * v;
  for (let tier = 0; tier < tiers; tier++) {
    // Tier 1 is entered (from far away) at FAR_GAPS source gaps from the zone's surface, tier j ≥ 2 at gap·2^−(j−1).
    const enterNext = tier === 0 ? FAR_GAPS * gap : gap / pow2(tier);
    inward2[tier] = tier === tiers - 1 ? -1 : sq(R + enterNext);
    const entered = tier === 0 ? Infinity : tier === 1 ? FAR_GAPS * gap : gap / pow2(tier - 1);
    outward2[tier] = tier === 0 ? Infinity : sq(R + HYSTERESIS * entered);
    target[tier] = pow2(1 - tier);
  }
  return {
    enabled,
    tiers,
    inward2,
    outward2,
    target,
    nearFace_m: hoods > 0 ? NEAR_FACE_m : 0,
    leaveFace_m: hoods > 0 ? HYSTERESIS_FACE * NEAR_FACE_m : 0,
    pecletIn: PECLET_IN,
    pecletOut: PECLET_IN / 2,
    deepFactor: DEEP_FACTOR,
  };
}

/** The tier of a point at squared distance r2 from the zone centre, ignoring hysteresis. */
export function tierAt(plan: ImportancePlan, r2: number): number {
  let tier = 0;
  while (r2 < plan.inward2[tier]) tier++;
  return tier;
}

function copyRow(k: Kernel, from: number, to: number): void {
  const a = k.a;
  a.x[to] = a.x[from];
  a.y[to] = a.y[from];
  a.z[to] = a.z[from];
  a.t[to] = a.t[from];
  a.release[to] = a.release[from];
  a.exhaustAt[to] = a.exhaustAt[from];
  a.wallAt[to] = a.wallAt[from];
  a.ux[to] = a.ux[from];
  a.uy[to] = a.uy[from];
  a.uz[to] = a.uz[from];
  a.bin[to] = a.bin[from];
  a.slot[to] = a.slot[from];
  a.w[to] = a.w[from];
  a.level[to] = a.level[from];
  a.deep[to] = a.deep[from];
  a.child[to] = a.child[from];
  k.ids[to] = k.ids[from];
}

/**
 * Drops the row of a split copy that has ended (it sits at k.live, just behind the live block):
 * the last row in use moves into it, so rows in use stay the released particles plus live copies.
 */
export function dropChildRow(k: Kernel, row: number): void {
  const last = --k.rows;
  if (row !== last) copyRow(k, last, row);
}

/**
 * Applies the weight window to live particle i, whose tier or deep flag has just changed (the walk
 * stopped before its step and left the new target in k.pendingTarget). Returns 1 if roulette
 * removed it, in which case row i now holds another live particle.
 */
export function reweight(k: Kernel, i: number): number {
  const a = k.a;
  const target = k.pendingTarget;
  const q = a.w[i] / target;
  if (q <= 1 / WINDOW) {
    if (k.rng.nextUniform() < q) {
      a.w[i] = target;
      return 0;
    }
    k.rouletteKilled++;
    remove(k, i);
    return 1;
  }
  // Copies beyond the store's room are not made: a split that does not happen is still unbiased.
  let n = Math.round(q);
  const room = a.capacity - k.rows;
  if (n - 1 > room) n = room + 1;
  if (n < 2) return 0;
  const w = a.w[i] / n;
  a.w[i] = w;
  for (let c = 1; c < n; c++) addCopy(k, i, w);
  return 0;
}

// A copy goes to row k.live (the first row behind the live block); whatever ended there moves to
// the end of the rows in use.
function addCopy(k: Kernel, parent: number, w: number): void {
  const a = k.a;
  const row = k.live;
  if (row < k.rows) copyRow(k, row, k.rows);
  k.rows++;
  copyRow(k, parent, row);
  a.w[row] = w;
  a.child[row] = 1;
  a.slot[row] = -1;
  // The copy's own time to leave with the room air (and to wrapped walls): memoryless, so drawn afresh from now.
  const t = a.t[row];
  if (k.exhaustRate_perS > 0) a.exhaustAt[row] = t - log(k.rng.nextUniform()) / k.exhaustRate_perS;
  const wallRate = k.wrappedWallRate_perS[a.bin[row]];
  if (wallRate > 0) a.wallAt[row] = t - log(k.rng.nextUniform()) / wallRate;
  k.live++;
  k.copies++;
}

// Roulette's loser leaves no tally. A released particle keeps its row (its final state is kept in
// release order); a copy's row is dropped.
function remove(k: Kernel, i: number): void {
  const a = k.a;
  const last = --k.live;
  swapRows(k, i, last);
  if (a.child[last]) dropChildRow(k, last);
  else k.fate[k.ids[last]] = FATE_REMOVED;
}

/** Fate recorded for a released particle that roulette removed (its weight went to the survivors). */
export const FATE_REMOVED = -2;

type Column = Float64Array | Int32Array | Int8Array | Uint8Array;

function swap(arr: Column, i: number, j: number): void {
  const v = arr[i];
  arr[i] = arr[j];
  arr[j] = v;
}

/** Swaps two rows of every per-particle column. */
export function swapRows(k: Kernel, i: number, j: number): void {
  if (i === j) return;
  const a = k.a;
  swap(a.x, i, j);
  swap(a.y, i, j);
  swap(a.z, i, j);
  swap(a.t, i, j);
  swap(a.release, i, j);
  swap(a.exhaustAt, i, j);
  swap(a.wallAt, i, j);
  swap(a.ux, i, j);
  swap(a.uy, i, j);
  swap(a.uz, i, j);
  swap(a.w, i, j);
  swap(a.bin, i, j);
  swap(a.slot, i, j);
  swap(k.ids, i, j);
  swap(a.level, i, j);
  swap(a.deep, i, j);
  swap(a.child, i, j);
}
