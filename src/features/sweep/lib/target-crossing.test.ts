import { describe, expect, it } from 'vitest';
import { targetCrossing } from './target-crossing';

const airflow = [
  { value: 0.2, upperPercent: 140 },
  { value: 0.4, upperPercent: 70 },
  { value: 0.6, upperPercent: 30 },
];

describe('target crossing', () => {
  it('interpolates the least airflow linearly between the failing and the meeting point', () => {
    // 50 % lies halfway between 70 % at 0.4 and 30 % at 0.6 m³/s.
    expect(targetCrossing(airflow, 50, 'smallest')).toEqual({ kind: 'interpolated', value: 0.5, meets: 0.6, fails: 0.4 });
  });

  it('interpolates the largest distance that still meets, whatever order the points come in', () => {
    const distance = [
      { value: 0.5, upperPercent: 90 },
      { value: 0.1, upperPercent: 10 },
      { value: 0.3, upperPercent: 40 },
    ];
    const c = targetCrossing(distance, 50, 'largest');
    expect(c.kind).toBe('interpolated');
    if (c.kind === 'interpolated') {
      expect(c.value).toBeCloseTo(0.3 + (10 / 50) * 0.2, 12);
      expect([c.meets, c.fails]).toEqual([0.3, 0.5]);
    }
  });

  it('says the answer lies beyond the range when the best swept point already meets', () => {
    expect(targetCrossing(airflow, 200, 'smallest')).toEqual({ kind: 'beyond-range', value: 0.2 });
  });

  it('says none meets when every upper bound is above the target', () => {
    expect(targetCrossing(airflow, 20, 'smallest')).toEqual({ kind: 'none' });
  });

  it('counts a point exactly at the target as meeting it', () => {
    expect(targetCrossing(airflow, 70, 'smallest')).toMatchObject({ value: 0.4, meets: 0.4, fails: 0.2 });
  });

  it('takes the most preferred meeting point when the curve is not monotonic', () => {
    const bumpy = [
      { value: 0.2, upperPercent: 40 },
      { value: 0.4, upperPercent: 60 },
      { value: 0.6, upperPercent: 20 },
    ];
    expect(targetCrossing(bumpy, 50, 'smallest')).toEqual({ kind: 'beyond-range', value: 0.2 });
  });
});
