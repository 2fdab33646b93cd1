import type { CompareColumn } from './types';

export type TargetId = 'tenth' | 'half' | 'limit';

export interface Target {
  id: TargetId;
  label: string;
  /** Share of the OEL the upper 95 % bound of the 8-h TWA must stay below. */
  shareOfLimit: number;
  note?: string;
}

export const TARGETS: readonly Target[] = [
  { id: 'tenth', label: 'Below a tenth of the limit', shareOfLimit: 0.1 },
  {
    id: 'half',
    label: 'Below half the limit (the action level)',
    shareOfLimit: 0.5,
    note: 'Action level = ½ OEL, US practice (29 CFR 1910.1053).',
  },
  { id: 'limit', label: 'Below the limit', shareOfLimit: 1 },
];

export const DEFAULT_TARGET: TargetId = 'half';

export const targetFor = (id: string | null | undefined): Target =>
  TARGETS.find((t) => t.id === id) ?? TARGETS.find((t) => t.id === DEFAULT_TARGET)!;

// The upper bound, not the mean: an option only counts when its statistical error cannot hide an exceedance.
export function meetsTarget(column: CompareColumn, target: Target): boolean {
  const limit = column.run?.limit;
  if (!column.run || !limit) return false;
  const upper_mgPerM3 = column.run.fractions[limit.fraction].twa8hCi95_mgPerM3[1];
  return Number.isFinite(upper_mgPerM3) && upper_mgPerM3 < target.shareOfLimit * limit.value_mgPerM3;
}

/** Id of the option that meets the target with the least total hood airflow; ties go to the higher tier (earlier column). */
export function leastAirflowMeeting(columns: readonly CompareColumn[], target: Target): number | null {
  let best: CompareColumn | null = null;
  for (const c of columns) if (meetsTarget(c, target) && (!best || c.totalAirflow_m3PerS < best.totalAirflow_m3PerS)) best = c;
  return best?.id ?? null;
}
