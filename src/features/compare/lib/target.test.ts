import { describe, expect, it } from 'vitest';
import { dailyP95, DEFAULT_DAY_TO_DAY_GSD } from '../../../../shared/verdict/index';
import { column } from './column.test-helper';
import { leastAirflowMeeting, meetsTarget, shortfall, targetFor } from './target';

const half = targetFor('half');
const limit = targetFor('limit');
// The helper's limit: 0.025 mg/m³ respirable. The verdict's daily 95th percentile is the upper bound times
// GSD^1.645 / e^(½ ln² GSD) with the default day-to-day GSD of 2.7 (Buringh & Lanting 1991, from shared/verdict).
const factor = dailyP95(1, DEFAULT_DAY_TO_DAY_GSD);
// An upper bound whose daily 95th percentile sits at the given share of the limit.
const upperAt = (shareOfLimit: number) => (shareOfLimit * 0.025) / factor;

describe('choosing the option that meets the target with the least airflow', () => {
  it('defaults to half the limit and says the action level is half the OEL', () => {
    expect(targetFor(null)).toMatchObject({ id: 'half', shareOfLimit: 0.5 });
    expect(targetFor('nonsense').id).toBe('half');
    expect(half.note).toMatch(/½ OEL.*29 CFR 1910\.1053/);
  });

  it('judges as the verdict does, on the daily 95th percentile from the upper bound, not on the bound itself', () => {
    // Upper bound at 20 % of the limit: below half on the bound alone, but its daily 95th percentile is about 63 %
    // (and about 53 % from the lower bound, so the run has decided).
    const c = column(1, { twa: 0.0045, ci: [0.0042, 0.005] });
    expect(c.run!.limit!.p95_mgPerM3! / 0.025).toBeGreaterThan(0.5);
    expect(meetsTarget(c, half)).toBe(false);
    expect(meetsTarget(c, limit)).toBe(true);
    expect(c.run!.limit!.banner).toBe('watch');
  });

  it('meets half the limit exactly when the verdict reads Clear', () => {
    const hi = upperAt(0.45);
    const c = column(1, { twa: hi * 0.9, ci: [hi * 0.8, hi] });
    expect(c.run!.limit!.banner).toBe('clear');
    expect(meetsTarget(c, half)).toBe(true);
  });

  it('does not count a run whose interval straddles half the limit, even against the limit itself (it never reads Clear either)', () => {
    const c = column(1, { twa: 0.0045, ci: [0.0035, 0.005] });
    expect(c.run!.limit!.decided).toBe(false);
    expect(meetsTarget(c, limit)).toBe(false);
  });

  it('does not count a run that has not decided, even with its 95th percentile below the target', () => {
    // Too few particles reached the breathing zone (fewer than the verdict's 300), so the verdict keeps it undecided.
    const hi = upperAt(0.05);
    const c = column(1, { twa: hi * 0.9, ci: [hi * 0.8, hi], zoneHistories: 40 });
    expect(c.run!.limit!.decided).toBe(false);
    expect(meetsTarget(c, half)).toBe(false);
    expect(shortfall(c, half)).toMatch(/not decided/);
  });

  it('does not count a hood below half its capture velocity, however low the simulated exposure', () => {
    const hi = upperAt(0.05);
    const c = column(1, { airflow_m3PerS: 0.2, twa: hi * 0.9, ci: [hi * 0.8, hi], captureVelocity: 'below-half' });
    expect(meetsTarget(c, limit)).toBe(false);
    expect(shortfall(c, limit)).toMatch(/capture velocity/);
  });

  it('never counts a scenario without a run', () => {
    expect(meetsTarget(column(1, { run: false }), limit)).toBe(false);
    expect(shortfall(column(1, { run: false }), limit)).toBe('not run');
  });

  it('picks the least total airflow among the options that meet the target', () => {
    const at = (share: number) => ({ twa: upperAt(share) * 0.9, ci: [upperAt(share) * 0.8, upperAt(share)] as [number, number] });
    const columns = [
      column(1, at(3)),
      column(2, { airflow_m3PerS: 0.6, ...at(0.05) }),
      column(3, { airflow_m3PerS: 0.35, ...at(0.3) }),
      column(4, { airflow_m3PerS: 0.2, ...at(0.7) }),
    ];
    expect(leastAirflowMeeting(columns, half)).toBe(3);
    expect(leastAirflowMeeting(columns, limit)).toBe(4);
    expect(shortfall(columns[0], limit)).toBe('above the target');
  });

  it('gives the tie to the earlier column, which ranks higher in the hierarchy', () => {
    const low = { twa: upperAt(0.05) * 0.9, ci: [upperAt(0.05) * 0.8, upperAt(0.05)] as [number, number] };
    expect(leastAirflowMeeting([column(7, { airflow_m3PerS: 0.3, ...low }), column(8, { airflow_m3PerS: 0.3, ...low })], half)).toBe(7);
  });

  it('answers null when nothing meets the target', () => {
    expect(leastAirflowMeeting([column(1, { twa: 0.1 }), column(2, { run: false })], targetFor('tenth'))).toBeNull();
  });
});
