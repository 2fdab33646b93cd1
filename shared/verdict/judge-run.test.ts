import { describe, expect, it } from 'vitest';
import { dailyP95 } from './day-to-day';
import { judgeRun, type RunNumbers } from './judge-run';

const LIMIT = { fraction: 'respirable' as const, value_mgPerM3: 1 };
// The daily 95th percentile is 3.13 × the upper bound at the default GSD 2.7 ([C] day-to-day.ts).
const factor = dailyP95(1, 2.7);
const run = (mean: number, lo: number, hi: number, zoneHistories: number | 'unknown' = 5000, histories = 40_000): RunNumbers => ({
  twa8h_mgPerM3: mean,
  twa8hCi95_mgPerM3: [lo, hi],
  zoneHistories: zoneHistories === 'unknown' ? undefined : zoneHistories,
  histories,
});

describe('judgeRun: the banner on the daily 95th percentile', () => {
  it('gives Clear only when the 95th percentile from the upper bound is under half the limit (action level, 29 CFR 1910.1053)', () => {
    const v = judgeRun(run(0.1, 0.09, 0.11), LIMIT);
    expect(v.p95_mgPerM3).toBeCloseTo(0.11 * factor, 12);
    expect(v).toMatchObject({ banner: 'clear', decided: true, reasons: [], ratingCategory: 2, moreHistories: 0 });
    expect(v.percentOfLimit).toBeCloseTo(10, 12);
    expect(v.percentOfLimitUpper).toBeCloseTo(11, 12);
  });

  it('gives Watch where the mean of one simulated day is under half the limit but the daily 95th percentile is not', () => {
    expect(judgeRun(run(0.2, 0.19, 0.21), LIMIT)).toMatchObject({ banner: 'watch', decided: true, ratingCategory: 3 });
  });

  it('gives Act above the limit and rates it category 4 (AIHA bands, physics.md §10)', () => {
    expect(judgeRun(run(6.41, 6.0, 7.0), LIMIT)).toMatchObject({ banner: 'act', decided: true, ratingCategory: 4 });
  });

  it('judges the same numbers again when the limit changes: a tenth of the limit turns Clear into Act', () => {
    const numbers = run(0.08, 0.075, 0.085);
    expect(judgeRun(numbers, LIMIT).banner).toBe('clear');
    expect(judgeRun(numbers, { ...LIMIT, value_mgPerM3: 0.1 }).banner).toBe('act');
  });

  it('lets a smaller day-to-day GSD pass what the default does not', () => {
    const numbers = run(0.2, 0.19, 0.21);
    expect(judgeRun(numbers, LIMIT, { gsd: 1.2 })).toMatchObject({ banner: 'clear', gsd: 1.2 });
  });
});

describe('judgeRun: the guards that keep doubt from reading as Clear', () => {
  it('says how many more particles to run when fewer than 300 reached the breathing zone, and stays Watch', () => {
    const v = judgeRun(run(0.01, 0.009, 0.011, 60, 40_000), LIMIT);
    expect(v).toMatchObject({ banner: 'watch', decided: false });
    // 300 at 60 per 40,000 needs 200,000 in all: 160,000 more.
    expect(v.moreHistories).toBe(160_000);
    expect(v.reasons[0]).toMatch(/^Not enough particles reached the breathing zone to decide: 60 of 40,000.*about 160,000 more/);
  });

  it('keeps Act with few histories when even the upper bound is above the limit', () => {
    expect(judgeRun(run(2, 1.5, 2.5, 40), LIMIT)).toMatchObject({ banner: 'act', decided: false });
  });

  it('says no dust reached the breathing zone, as Watch, when no history got there', () => {
    const v = judgeRun(run(0.001, 0.001, 0.001, 0, 20), LIMIT);
    expect(v).toMatchObject({ banner: 'watch', decided: false, moreHistories: null });
    expect(v.reasons[0]).toMatch(/^No simulated dust reached the breathing zone in 20 histories/);
  });

  it('treats a result without the count (older engines) as unknown: not decided, never Clear', () => {
    const v = judgeRun(run(0.01, 0.009, 0.011, 'unknown'), LIMIT);
    expect(v).toMatchObject({ banner: 'watch', decided: false });
    expect(v.reasons[0]).toMatch(/does not say how many/);
  });

  it('never presents a zero-width interval as decided', () => {
    const v = judgeRun(run(0.01, 0.01, 0.01), LIMIT);
    expect(v).toMatchObject({ banner: 'watch', decided: false });
    expect(v.reasons[0]).toMatch(/no width/);
  });

  it('says there are not enough particles to decide when the interval spans half the limit, with an estimate of how many more', () => {
    // p95 from the bounds: 0.10·3.13 = 0.31 and 0.22·3.13 = 0.69 lie either side of 0.5.
    const v = judgeRun(run(0.16, 0.1, 0.22), LIMIT);
    expect(v).toMatchObject({ banner: 'watch', decided: false });
    expect(v.reasons[0]).toMatch(/^Not enough particles to decide: .* half the limit/);
    // The threshold in mean terms is 0.5/3.13 = 0.160: the mean sits almost on it, so many more are needed.
    expect(v.moreHistories).toBeGreaterThan(1_000_000);
  });

  it('says the same when the interval spans the limit itself, and keeps the cautious Act', () => {
    const v = judgeRun(run(0.3, 0.25, 0.35), LIMIT);
    expect(v).toMatchObject({ banner: 'act', decided: false });
    expect(v.reasons[0]).toMatch(/on both sides of the limit/);
  });

  it('never gives Clear when the hood is below half the capture velocity for the release, and says to measure', () => {
    const v = judgeRun(run(0.01, 0.009, 0.011), LIMIT, { captureVelocity: 'below-half' });
    expect(v.banner).toBe('watch');
    expect(v.reasons).toEqual([expect.stringMatching(/below half the lower end of the range for this release: confirm by measurement/)]);
    expect(judgeRun(run(0.01, 0.009, 0.011), LIMIT, { captureVelocity: 'below' }).banner).toBe('clear');
  });

  it('with the hood below half its capture velocity, decides on the limit alone: across half the limit it reads Watch either way', () => {
    // The same interval as the action-level case above: 0.31 and 0.69 of the limit, either side of 0.5 but under 1.
    const across = judgeRun(run(0.16, 0.1, 0.22), LIMIT, { captureVelocity: 'below-half' });
    expect(across).toMatchObject({ banner: 'watch', decided: true, moreHistories: 0 });
    expect(across.reasons).toEqual([expect.stringMatching(/below half the lower end/)]);
    // Across the limit itself it is still undecided, and stays the cautious Act.
    const overLimit = judgeRun(run(0.3, 0.25, 0.35), LIMIT, { captureVelocity: 'below-half' });
    expect(overLimit).toMatchObject({ banner: 'act', decided: false });
    expect(overLimit.reasons[0]).toMatch(/on both sides of the limit/);
    // Too few zone histories still leave it undecided.
    expect(judgeRun(run(0.16, 0.1, 0.22, 60), LIMIT, { captureVelocity: 'below-half' })).toMatchObject({ decided: false });
  });

  it('does not trust a stored interval that leaves out its own mean', () => {
    const v = judgeRun(run(0.3, 0.001, 0.002), LIMIT);
    expect(v.decided).toBe(false);
    expect(v.banner).toBe('watch');
    expect(v.p95_mgPerM3).toBeCloseTo(0.3 * factor, 12);
  });

  it('refuses a limit that is not positive, quoting it', () => {
    expect(() => judgeRun(run(0.1, 0.09, 0.11), { ...LIMIT, value_mgPerM3: 0 })).toThrow(/limit\.value_mgPerM3.*0/);
  });
});
