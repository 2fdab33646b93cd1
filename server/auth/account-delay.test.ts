import { describe, expect, it } from 'vitest';
import { accountDelay } from './account-delay';

// Policy values are common practice (a few free typos, then doubling, capped), not from a standard.
const POLICY = { freeFailures: 2, baseDelayMs: 100, maxDelayMs: 500, windowMs: 1000 };

describe('account delay', () => {
  it('costs nothing for the first failures, then doubles up to the cap', () => {
    const d = accountDelay(POLICY, () => 0);
    const waits: number[] = [];
    for (let i = 0; i < 6; i += 1) {
      waits.push(d.delayMs('a@b.c'));
      d.failed('a@b.c');
    }
    expect(waits).toEqual([0, 0, 100, 200, 400, 500]);
    expect(d.delayMs('other@b.c')).toBe(0);
  });

  it('forgets failures after the window and after a successful sign-in', () => {
    let now = 0;
    const d = accountDelay(POLICY, () => now);
    for (let i = 0; i < 3; i += 1) d.failed('a@b.c');
    expect(d.delayMs('a@b.c')).toBe(200);
    now = 1001;
    expect(d.delayMs('a@b.c')).toBe(0);
    for (let i = 0; i < 4; i += 1) d.failed('a@b.c');
    d.succeeded('a@b.c');
    expect(d.delayMs('a@b.c')).toBe(0);
  });

  it('holds at most 10,000 accounts under a flood of made-up addresses, dropping the oldest first', () => {
    const d = accountDelay(POLICY, () => 0);
    for (let i = 0; i < 3; i += 1) d.failed('first@b.c');
    for (let i = 0; i < 20_000; i += 1) d.failed(`random-${i}@b.c`);
    expect(d.delayMs('first@b.c')).toBe(0);
    d.failed('random-19999@b.c');
    d.failed('random-19999@b.c');
    expect(d.delayMs('random-19999@b.c')).toBe(200);
  });
});
