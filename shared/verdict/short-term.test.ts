import { describe, expect, it } from 'vitest';
import { agentLimit } from './agent-limit';
import { judgeOptions } from './judge-options';
import { judgeRun, type RunNumbers } from './judge-run';

// A clear 8-h result (p95 = 0.011·3.13 ≈ 0.034 of a 1 mg/m³ limit, [C] day-to-day.ts) with a peak to compare.
const run = (peak: number, lo: number, hi: number): RunNumbers => ({
  twa8h_mgPerM3: 0.01,
  twa8hCi95_mgPerM3: [0.009, 0.011],
  zoneHistories: 5000,
  histories: 40_000,
  peak15min_mgPerM3: peak,
  peak15minCi95_mgPerM3: [lo, hi],
});
// A short-term limit of 3 mg/m³ beside the 8-h 1 mg/m³ (invented numbers for the rule, not an agent's).
const LIMIT = { fraction: 'respirable' as const, value_mgPerM3: 1, shortTerm_mgPerM3: 3 };

describe('peak 15-min average against the short-term limit', () => {
  it('is below when the whole interval is below, and leaves the 8-h banner alone', () => {
    const v = judgeRun(run(1, 0.8, 1.2), LIMIT);
    expect(v.shortTerm).toMatchObject({ value_mgPerM3: 3, exceeds: 'no' });
    expect(v.shortTerm!.percentOfLimit).toBeCloseTo(100 / 3, 9);
    expect(v).toMatchObject({ banner: 'clear', decided: true });
  });
  it('keeps the banner from Clear when the interval reaches above the short-term limit', () => {
    const v = judgeRun(run(2.5, 2, 3.5), LIMIT);
    expect(v).toMatchObject({ banner: 'watch', decided: false, shortTerm: { exceeds: 'maybe' } });
    expect(v.reasons.join(' ')).toMatch(/15-min short-term limit/);
  });
  it('gives Act when even the lower bound is above the short-term limit', () => {
    const v = judgeRun(run(5, 4, 6), LIMIT);
    expect(v).toMatchObject({ banner: 'act', shortTerm: { exceeds: 'yes' } });
    expect(v.reasons[0]).toMatch(/above the short-term limit/);
  });
  it('has no short-term part without a short-term limit or without a peak', () => {
    expect(judgeRun(run(5, 4, 6), { fraction: 'respirable', value_mgPerM3: 1 }).shortTerm).toBeUndefined();
    const { peak15min_mgPerM3: _p, peak15minCi95_mgPerM3: _c, ...noPeak } = run(5, 4, 6);
    expect(judgeRun(noPeak, LIMIT).shortTerm).toBeUndefined();
  });
  it('takes the agent’s 15-min limit beside its 8-h one', () => {
    const data = { limitFraction: 'respirable' as const, limit8h_mgPerM3: 1, override: null };
    expect(agentLimit({ ...data, limit15min_mgPerM3: 3 })).toEqual(LIMIT);
    expect(agentLimit({ ...data, limit15min_mgPerM3: null })).not.toHaveProperty('shortTerm_mgPerM3');
  });
});

describe('judgeOptions: what the scenario adds to the verdict', () => {
  const scenario = { source: { x_m: 0, y_m: 0, z_m: 0 }, hoods: [] };
  it('passes the worker’s day-to-day GSD and leaves it out when the scenario keeps the default', () => {
    expect(judgeOptions({ ...scenario, worker: { dayToDayGsd: 1.8 } })).toEqual({ gsd: 1.8 });
    expect(judgeOptions({ ...scenario, worker: {} })).toEqual({});
  });
  it('lets an edited GSD move the verdict: 0.2 of the limit is Watch at 2.7 and Clear at 1.5', () => {
    const numbers: RunNumbers = { twa8h_mgPerM3: 0.2, twa8hCi95_mgPerM3: [0.19, 0.21], zoneHistories: 5000, histories: 40_000 };
    const limit = { fraction: 'respirable' as const, value_mgPerM3: 1 };
    expect(judgeRun(numbers, limit, judgeOptions({ ...scenario, worker: {} })).banner).toBe('watch');
    expect(judgeRun(numbers, limit, judgeOptions({ ...scenario, worker: { dayToDayGsd: 1.5 } })).banner).toBe('clear');
  });
});
