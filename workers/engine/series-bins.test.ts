import { describe, expect, it } from 'vitest';
import { chooseMerge, MIN_VISITS_PER_BIN, mergedBand, visitsPerTimeBin } from './series-bins';

describe('time bins sized to their zone visits', () => {
  it('keeps the engine bins when each already holds enough visits', () => {
    const m = chooseMerge(new Float64Array(120).fill(40));
    expect(m).toMatchObject({ merge: 1, sparse: false });
  });

  it('merges until every bin that carries dust holds at least the minimum', () => {
    // 8 visits per engine bin: 4 bins make 32 ≥ 30.
    const m = chooseMerge(new Float64Array(120).fill(8));
    expect(m.merge).toBe(4);
    expect(Math.min(...m.visits)).toBeGreaterThanOrEqual(MIN_VISITS_PER_BIN);
  });

  it('ignores nearly empty bins before the dust arrives', () => {
    const visits = new Float64Array(120).fill(40);
    visits.fill(0.5, 0, 10);
    expect(chooseMerge(visits).merge).toBe(1);
  });

  it('calls the series sparse when even the coarsest bins hold too few', () => {
    const m = chooseMerge(new Float64Array(120).fill(0.1));
    expect(m).toMatchObject({ merge: 15, sparse: true });
    expect(m.visits).toHaveLength(8);
  });

  it('spreads each size bin’s histories over time by its residence, keeping their total', () => {
    // Two size bins: bin 0 resides only in time bin 0, bin 1 evenly in both; the fraction counts both.
    const residence = Float64Array.of(3, 1, 0, 1);
    const v = visitsPerTimeBin(residence, [10, 4], [1, 1], 2);
    expect(Array.from(v)).toEqual([12, 2]);
    expect(Array.from(visitsPerTimeBin(residence, [10, 4], [0, 1], 2))).toEqual([2, 2]);
  });

  it('averages merged bins per batch before the interval across batches', () => {
    const band = mergedBand([Float64Array.of(1, 3, 5, 7), Float64Array.of(3, 5, 7, 9)], 2);
    expect(band.mean).toEqual([3, 7]);
    expect(band.hi[0]).toBeGreaterThan(band.lo[0]);
  });
});
