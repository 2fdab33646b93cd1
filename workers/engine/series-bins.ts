import { batchEstimate } from './statistics';

/** Zone visits a plotted time bin needs before its mean and band read as data rather than noise (common practice: n ≥ 30). */
export const MIN_VISITS_PER_BIN = 30;
/** Merge factors tried, each dividing the engine's 120 time bins; 15 leaves 8 points on the chart. */
const MERGES = [1, 2, 3, 4, 5, 6, 8, 10, 12, 15];

export interface MergedSeries {
  merge: number;
  /** Estimated zone visits per merged bin. */
  visits: number[];
  sparse: boolean;
}

/**
 * Histories that visited the zone during each raw time bin, estimated by spreading each size bin's
 * zone histories over time in proportion to its residence there (the sum over time is the count).
 * `residence` is [timeBin][sizeBin] summed over batches; `histories` per size bin; `weight` selects the fraction's bins.
 */
export function visitsPerTimeBin(
  residence: Float64Array,
  histories: ArrayLike<number>,
  weight: ArrayLike<number>,
  timeBins: number,
): Float64Array {
  const nB = histories.length;
  const total = new Float64Array(nB);
  for (let tb = 0; tb < timeBins; tb++) for (let b = 0; b < nB; b++) total[b] += residence[tb * nB + b];
  const visits = new Float64Array(timeBins);
  for (let tb = 0; tb < timeBins; tb++)
    for (let b = 0; b < nB; b++) if (weight[b] > 0 && total[b] > 0) visits[tb] += (histories[b] * residence[tb * nB + b]) / total[b];
  return visits;
}

function merged(values: ArrayLike<number>, merge: number): number[] {
  const out: number[] = [];
  for (let i = 0; i + merge <= values.length; i += merge) {
    let sum = 0;
    for (let j = i; j < i + merge; j++) sum += values[j];
    out.push(sum);
  }
  return out;
}

// A bin that carries less than a quarter of an even share of the dust is near zero whatever its noise; the rest must hold enough visits.
function readable(visits: number[]): boolean {
  const total = visits.reduce((a, v) => a + v, 0);
  if (!(total >= MIN_VISITS_PER_BIN)) return false;
  const floor = total / (4 * visits.length);
  return visits.every((v) => v < floor || v >= MIN_VISITS_PER_BIN);
}

/** The finest merge of the raw time bins at which every bin that matters holds enough visits; sparse when none does. */
export function chooseMerge(visits: Float64Array): MergedSeries {
  const usable = MERGES.filter((m) => visits.length % m === 0);
  for (const merge of usable) {
    const v = merged(visits, merge);
    if (readable(v)) return { merge, visits: v, sparse: false };
  }
  const merge = usable[usable.length - 1] ?? 1;
  return { merge, visits: merged(visits, merge), sparse: true };
}

/** Visits and readability of a fraction on an already chosen grid. */
export function onMerge(visits: Float64Array, merge: number): MergedSeries {
  const v = merged(visits, merge);
  return { merge, visits: v, sparse: !readable(v) };
}

/** Mean and 95 % band across batches of each merged bin (a merged bin's value is the mean of its raw bins). */
export function mergedBand(perBatch: readonly Float64Array[], merge: number): { mean: number[]; lo: number[]; hi: number[] } {
  const bins = Math.floor((perBatch[0]?.length ?? 0) / merge);
  const band = { mean: [] as number[], lo: [] as number[], hi: [] as number[] };
  const values = new Float64Array(perBatch.length);
  for (let i = 0; i < bins; i++) {
    perBatch.forEach((s, k) => {
      let sum = 0;
      for (let j = i * merge; j < (i + 1) * merge; j++) sum += s[j];
      values[k] = sum / merge;
    });
    const e = batchEstimate(values);
    band.mean.push(e.mean);
    band.lo.push(e.lo);
    band.hi.push(e.hi);
  }
  return band;
}
