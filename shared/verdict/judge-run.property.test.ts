import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { judgeRun } from './judge-run';
import { MIN_ZONE_HISTORIES } from './zone-histories';

const RANK = { clear: 0, watch: 1, act: 2 } as const;

// Sound stored numbers: lo ≤ mean ≤ hi, over six decades around a limit of 1 mg/m³.
const concentration = fc.double({ min: -4, max: 2, noNaN: true }).map((e) => 10 ** e);
const numbers = fc.record({
  mean: concentration,
  below: fc.double({ min: 0, max: 1, noNaN: true }),
  above: fc.double({ min: 0, max: 3, noNaN: true }),
  zoneHistories: fc.oneof(fc.constant(undefined), fc.integer({ min: 0, max: 5000 })),
  histories: fc.integer({ min: 1, max: 5_000_000 }),
});
const options = fc.record({
  gsd: fc.double({ min: 1, max: 4, noNaN: true }),
  captureVelocity: fc.constantFrom(undefined, 'below-half' as const, 'below' as const, 'within' as const, 'above' as const),
});
const limit = fc.double({ min: 0.001, max: 100, noNaN: true }).map((value_mgPerM3) => ({ fraction: 'respirable' as const, value_mgPerM3 }));

type Numbers = { mean: number; below: number; above: number; zoneHistories: number | undefined; histories: number };
const judge = (n: Numbers, hi: number, l: { fraction: 'respirable'; value_mgPerM3: number }, o: Parameters<typeof judgeRun>[2]) =>
  judgeRun(
    { twa8h_mgPerM3: n.mean, twa8hCi95_mgPerM3: [n.mean * (1 - n.below), hi], zoneHistories: n.zoneHistories, histories: n.histories },
    l,
    o,
  );

describe('judgeRun properties', () => {
  it('never gives Clear when a guard fires: too few zone histories, an undecided interval, or a hood too slow at the source', () => {
    fc.assert(
      fc.property(numbers, limit, options, (n, l, o) => {
        const v = judge(n, n.mean * (1 + n.above), l, o);
        const guarded =
          !v.decided || o.captureVelocity === 'below-half' || n.zoneHistories === undefined || n.zoneHistories < MIN_ZONE_HISTORIES;
        if (guarded) expect(v.banner).not.toBe('clear');
        if (!v.decided) expect(v.reasons.length).toBeGreaterThan(0);
      }),
      { numRuns: 2000 },
    );
  });

  it('never lowers the banner when the upper bound rises, all else equal (over intervals of positive width)', () => {
    fc.assert(
      fc.property(numbers, fc.double({ min: 0, max: 3, noNaN: true }), limit, options, (n, extra, l, o) => {
        const lo = n.mean * (1 - n.below);
        const hi = n.mean * (1 + n.above);
        fc.pre(hi > lo);
        const a = judge(n, hi, l, o);
        const b = judge(n, hi * (1 + extra), l, o);
        expect(RANK[b.banner]).toBeGreaterThanOrEqual(RANK[a.banner]);
        expect(b.ratingCategory).toBeGreaterThanOrEqual(a.ratingCategory);
      }),
      { numRuns: 2000 },
    );
  });
});
