import { describe, expect, it } from 'vitest';
import { column } from './column.test-helper';
import { leastAirflowMeeting, meetsTarget, targetFor } from './target';

const half = targetFor('half');

describe('choosing the option that meets the target with the least airflow', () => {
  it('defaults to half the limit and says the action level is half the OEL', () => {
    expect(targetFor(null)).toMatchObject({ id: 'half', shareOfLimit: 0.5 });
    expect(targetFor('nonsense').id).toBe('half');
    expect(half.note).toMatch(/½ OEL.*29 CFR 1910\.1053/);
  });

  it('judges on the upper 95 % bound, not the mean', () => {
    // Mean 40 % of the limit, but the upper bound 60 %: not below half.
    expect(meetsTarget(column(1, { twa: 0.01, ci: [0.005, 0.015] }), half)).toBe(false);
    expect(meetsTarget(column(1, { twa: 0.01, ci: [0.009, 0.012] }), half)).toBe(true);
  });

  it('never counts a scenario without a run', () => {
    expect(meetsTarget(column(1, { run: false }), targetFor('limit'))).toBe(false);
  });

  it('picks the least total airflow among the options that meet the target', () => {
    const columns = [
      column(1, { twa: 0.1 }),
      column(2, { airflow_m3PerS: 0.6, twa: 0.002 }),
      column(3, { airflow_m3PerS: 0.35, twa: 0.004 }),
      column(4, { airflow_m3PerS: 0.2, twa: 0.02 }),
    ];
    expect(leastAirflowMeeting(columns, half)).toBe(3);
    expect(leastAirflowMeeting(columns, targetFor('limit'))).toBe(4);
  });

  it('gives the tie to the earlier column, which ranks higher in the hierarchy', () => {
    expect(
      leastAirflowMeeting([column(7, { airflow_m3PerS: 0.3, twa: 0.001 }), column(8, { airflow_m3PerS: 0.3, twa: 0.001 })], half),
    ).toBe(7);
  });

  it('answers null when nothing meets the target', () => {
    expect(leastAirflowMeeting([column(1, { twa: 0.1 }), column(2, { run: false })], targetFor('tenth'))).toBeNull();
  });
});
