import { describe, expect, it } from 'vitest';
import { recordDiff } from './record-diff';

describe('recordDiff', () => {
  it('lists only the leaves that differ, by dotted path', () => {
    const mine = { name: 'Quartz', data: { limit8h_mgPerM3: 0.025, override: null, notes: 'x' } };
    const saved = { name: 'Quartz', data: { limit8h_mgPerM3: 0.025, override: { limit8h_mgPerM3: 0.0125, reason: 'site' }, notes: 'x' } };
    expect(recordDiff(mine, saved)).toEqual([{ path: 'data.override', mine: null, saved: { limit8h_mgPerM3: 0.0125, reason: 'site' } }]);
  });

  it('treats a missing field and null alike, and finds nothing in equal records', () => {
    expect(recordDiff({ a: 1, b: null }, { a: 1 })).toEqual([]);
    expect(recordDiff({ a: { b: 2 } }, { a: { b: 3 }, c: 'new' })).toEqual([
      { path: 'a.b', mine: 2, saved: 3 },
      { path: 'c', mine: null, saved: 'new' },
    ]);
  });
});
