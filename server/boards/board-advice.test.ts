import { describe, expect, it } from 'vitest';
import { judgeRun } from '../../shared/verdict/index';
import { watchCause } from '../approvals/watch-cause';
import { boardAdvice } from './board-advice';

// Limit 0.025 mg/m³ respirable (ACGIH TLV for respirable crystalline silica); the verdict is the shared one.
const limit = { fraction: 'respirable' as const, value_mgPerM3: 0.025 };
const judged = (hi: number, zoneHistories = 5000, captureVelocity?: 'below-half') =>
  judgeRun({ twa8h_mgPerM3: hi * 0.9, twa8hCi95_mgPerM3: [hi * 0.8, hi], zoneHistories, histories: 40000 }, limit, { captureVelocity });
const last = (lines: string[]) => lines[lines.length - 1];

describe('why a station board reads Watch', () => {
  it('says close to the limit only when the daily 95th percentile is at or above half the limit', () => {
    // Upper bound 0.006 mg/m³: daily 95th percentile about 0.019 mg/m³ (GSD 2.7), 75 % of the limit.
    const v = judged(0.006);
    expect(v.banner).toBe('watch');
    expect(watchCause(v, undefined)).toBe('near-limit');
    expect(last(boardAdvice('watch', 30, null, 'near-limit'))).toMatch(/close to the limit/);
  });

  it('names a run with too few particles in the breathing zone as not yet decided, not as close to the limit', () => {
    // Far below half the limit, but 40 zone histories are fewer than the verdict's 300.
    const v = judged(0.0005, 40);
    expect(v).toMatchObject({ banner: 'watch', decided: false });
    expect(watchCause(v, undefined)).toBe('undecided');
    const line = last(boardAdvice('watch', 30, null, 'undecided'));
    expect(line).toMatch(/could not yet tell/);
    expect(line).not.toMatch(/close to the limit/);
  });

  it('names a hood below half its capture velocity as too weak, not as close to the limit', () => {
    const v = judged(0.0005, 5000, 'below-half');
    expect(v.banner).toBe('watch');
    expect(watchCause(v, 'below-half')).toBe('capture-short');
    const line = last(boardAdvice('watch', 30, null, 'capture-short'));
    expect(line).toMatch(/draws less air at the work than this kind of dust release needs/);
    expect(line).not.toMatch(/close to the limit/);
  });

  it('has no Watch cause for Clear or Act, and Clear and Act advice carry no Watch line', () => {
    expect(watchCause(judged(0.0005), undefined)).toBeNull();
    expect(watchCause(judged(0.05), undefined)).toBeNull();
    expect(boardAdvice('clear', 30, null, null).join(' ')).not.toMatch(/limit|checked/);
    expect(boardAdvice('act', null, 'There is no approved assessment for this station.', null)[0]).toMatch(/no approved assessment/);
  });

  it('says an out-of-date assessment is being checked again', () => {
    expect(last(boardAdvice('watch', null, null, 'out-of-date'))).toMatch(/out of date and is being checked again/);
  });

  it('gives a station approved without a hood no hood instructions, and a Watch board the reason it is being checked', () => {
    const lines = boardAdvice('clear', null, null, null, false);
    expect(lines.join(' ')).not.toMatch(/hood|airflow indicator/i);
    expect(lines[0]).toMatch(/no extraction/);
    const changed = 'The exposure limit for this dust changed after the assessment was approved: it is being checked again.';
    const watch = boardAdvice('watch', 30, changed, 'near-limit');
    expect(watch.slice(-2)).toEqual([changed, expect.stringMatching(/close to the limit/)]);
  });
});
