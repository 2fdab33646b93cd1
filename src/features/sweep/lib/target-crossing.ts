/** One swept point as the answer needs it: the parameter value and the upper 95 % bound as % of the limit. */
export interface CrossingPoint {
  value: number;
  upperPercent: number;
}

/** Distances are best large (room to work); airflow and face size are best small (fan power, space). */
export type Preferred = 'largest' | 'smallest';

export type Crossing =
  { kind: 'interpolated'; value: number; meets: number; fails: number } | { kind: 'beyond-range'; value: number } | { kind: 'none' };

/**
 * The most preferred value at which the upper 95 % bound meets the target. Between the best point
 * that meets and its neighbour that fails, the crossing is interpolated linearly on the upper bound;
 * when even the last swept point meets, the answer lies beyond the range and only that point is known.
 */
export function targetCrossing(points: readonly CrossingPoint[], targetPercent: number, preferred: Preferred): Crossing {
  const usable = points.filter((p) => Number.isFinite(p.value) && Number.isFinite(p.upperPercent));
  const ordered = [...usable].sort((a, b) => (preferred === 'largest' ? b.value - a.value : a.value - b.value));
  const best = ordered.findIndex((p) => p.upperPercent <= targetPercent);
  if (best === -1) return { kind: 'none' };
  const meets = ordered[best];
  if (best === 0) return { kind: 'beyond-range', value: meets.value };
  const fails = ordered[best - 1];
  const share = (targetPercent - meets.upperPercent) / (fails.upperPercent - meets.upperPercent);
  return { kind: 'interpolated', value: meets.value + share * (fails.value - meets.value), meets: meets.value, fails: fails.value };
}
