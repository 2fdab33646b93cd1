import type { CompareColumn } from './types';

export type TargetId = 'tenth' | 'half' | 'limit';

export interface Target {
  id: TargetId;
  label: string;
  /** Share of the OEL the verdict's daily 95th percentile (from the upper 95 % bound of the 8-h TWA) must stay below. */
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

/**
 * Read from the run's verdict (shared/verdict, judged by the server against today's limit), as the banner is: the
 * daily 95th percentile from the interval's upper bound. A run that has not decided, or a hood below half its
 * capture velocity, meets no target, just as it never reads Clear.
 */
export function meetsTarget(column: CompareColumn, target: Target): boolean {
  const verdict = column.run?.limit;
  if (!verdict || verdict.decided !== true || verdict.p95_mgPerM3 === undefined) return false;
  if (column.captureVelocity === 'below-half') return false;
  return verdict.p95_mgPerM3 < target.shareOfLimit * verdict.value_mgPerM3;
}

/** Why an option with a run does not meet the target, in a few words; null when it does. */
export function shortfall(column: CompareColumn, target: Target): string | null {
  const verdict = column.run?.limit;
  if (!column.run) return 'not run';
  if (!verdict) return 'no limit set';
  if (meetsTarget(column, target)) return null;
  if (verdict.decided !== true) return 'not decided: run more particles';
  if (column.captureVelocity === 'below-half') return 'hood below half its capture velocity';
  return 'above the target';
}

/** Id of the option that meets the target with the least total hood airflow; ties go to the higher tier (earlier column). */
export function leastAirflowMeeting(columns: readonly CompareColumn[], target: Target): number | null {
  let best: CompareColumn | null = null;
  for (const c of columns) if (meetsTarget(c, target) && (!best || c.totalAirflow_m3PerS < best.totalAirflow_m3PerS)) best = c;
  return best?.id ?? null;
}
