import { describe, expect, it } from 'vitest';
import type { HoodInput } from './hood-axis';
import { benchHint, hoodHint, SLOT_REACH_m } from './hood-hints';

// A = 0.4 m × 0.25 m = 0.1 m², Q = 0.5 m³/s, facing +x from (1, 1, 1).
const plain: HoodInput = {
  kind: 'plain',
  x_m: 1,
  y_m: 1,
  z_m: 1,
  direction: { azimuth_deg: 0, elevation_deg: 0 },
  faceWidth_m: 0.4,
  faceHeight_m: 0.25,
  airflow_m3PerS: 0.5,
};
const at = (x_m: number, y_m = 1, z_m = 1) => ({ x_m, y_m, z_m });

describe('hood hints', () => {
  it('give the centre-line velocities of physics.md §8 for a plain opening (A = 0.1 m², Q = 0.5 m³/s) [C]', () => {
    // [C] physics.md §8, from V = Q / (10 X² + A): 2.50, 1.00, 0.50, 0.192 m/s at 0.1, 0.2, 0.3, 0.5 m.
    const expected: [number, number][] = [
      [0.1, 2.5],
      [0.2, 1.0],
      [0.3, 0.5],
      [0.5, 0.1923],
    ];
    for (const [distance_m, v_mPerS] of expected) {
      const hint = hoodHint(plain, at(1 + distance_m), 'low')!;
      expect(hint.axial_m).toBeCloseTo(distance_m, 9);
      expect(hint.offAxis_m).toBeCloseTo(0, 9);
      expect(Math.abs(hint.centerline_mPerS! / v_mPerS - 1)).toBeLessThan(0.001);
    }
  });

  it('compares the velocity with the capture range for the release type', () => {
    const hint = hoodHint(plain, at(1.2), 'low')!;
    expect(hint.verdict).toBe('within');
    expect(hoodHint(plain, at(1.2), 'quiet')!.verdict).toBe('above');
    expect(hoodHint(plain, at(1.5), 'active')!.verdict).toBe('below');
    expect(hint.range).toMatchObject({ min_mPerS: 0.5, max_mPerS: 1.0 });
    // 0.5 m/s × (10 × 0.2² + 0.1) m² = 0.25 m³/s reaches the low end at 0.2 m.
    expect(hint.airflowForRange_m3PerS).toBeCloseTo(0.25, 9);
  });

  it('gives the face velocity Q/A', () => {
    expect(hoodHint(plain, at(1.2), 'low')!.faceVelocity_mPerS).toBeCloseTo(5, 9);
  });

  it('warns past 1.5 equivalent diameters, √(4A/π) = 0.357 m, so past 0.535 m [M]', () => {
    expect(hoodHint(plain, at(1.5), 'low')!.validUpTo_m).toBeCloseTo(0.5352, 3);
    expect(hoodHint(plain, at(1.5), 'low')!.beyondValidity).toBe(false);
    expect(hoodHint(plain, at(1.6), 'low')!.beyondValidity).toBe(true);
  });

  it('uses the slot reach for slots (common practice) and says nothing about reach for booths', () => {
    const slot: HoodInput = { ...plain, kind: 'slot', faceWidth_m: 1, faceHeight_m: 0.05 };
    const hint = hoodHint(slot, at(1 + SLOT_REACH_m + 0.1), 'low')!;
    expect(hint.rule).toBe('slot');
    expect(hint.beyondValidity).toBe(true);
    // Q / (3.7 L X) with L = 1 m, X = 0.6 m.
    expect(hint.centerline_mPerS).toBeCloseTo(0.5 / (3.7 * 0.6), 9);
    expect(hoodHint({ ...plain, kind: 'booth' }, at(3), 'low')!.beyondValidity).toBe(false);
  });

  it('flags a source behind the face and gives no velocity there', () => {
    const hint = hoodHint(plain, at(0.8), 'low')!;
    expect(hint.behind).toBe(true);
    expect(hint.centerline_mPerS).toBeNull();
    expect(hint.verdict).toBeNull();
  });

  it('splits the offset into along and off the axis for a tilted hood', () => {
    const down: HoodInput = { ...plain, direction: { azimuth_deg: 0, elevation_deg: -90 } };
    const hint = hoodHint(down, at(1.3, 1, 0.6), 'low')!;
    expect(hint.axial_m).toBeCloseTo(0.4, 9);
    expect(hint.offAxis_m).toBeCloseTo(0.3, 9);
    expect(hint.farOffAxis).toBe(false);
    expect(hoodHint(down, at(1.6, 1, 0.8), 'low')!.farOffAxis).toBe(true);
  });

  it('gives no hint while the face size or airflow is unusable', () => {
    expect(hoodHint({ ...plain, faceWidth_m: 0 }, at(1.2), 'low')).toBeNull();
    expect(hoodHint({ ...plain, airflow_m3PerS: -0.1 }, at(1.2), 'low')).toBeNull();
  });
});

describe('bench hints', () => {
  // A 1 m × 0.6 m work surface at 0.85 m; Q = 0.372 m³/s gives Q/A = 0.62 m/s [C].
  const bench: HoodInput = {
    ...plain,
    kind: 'downdraft-bench',
    x_m: 4,
    y_m: 3,
    z_m: 0.85,
    direction: { x: 0, y: 0, z: 1 },
    faceWidth_m: 1,
    faceHeight_m: 0.6,
    airflow_m3PerS: 0.372,
  };

  it('read the face velocity against the 0.5–1.0 m/s bench guidance (common practice)', () => {
    const h = benchHint(bench, { x_m: 4.3, y_m: 3.1, z_m: 0.95 })!;
    expect(h.faceVelocity_mPerS).toBeCloseTo(0.62, 12);
    expect(h).toMatchObject({ overSurface: true, verdict: 'within', range: { min_mPerS: 0.5, max_mPerS: 1 } });
    expect(h.height_m).toBeCloseTo(0.1, 12);
    expect(h.offCentre_m).toBeCloseTo(Math.hypot(0.3, 0.1), 12);
    expect(benchHint({ ...bench, airflow_m3PerS: 0.2 }, { x_m: 4, y_m: 3, z_m: 0.9 })!.verdict).toBe('below');
    expect(benchHint({ ...bench, airflow_m3PerS: 0.9 }, { x_m: 4, y_m: 3, z_m: 0.9 })!.verdict).toBe('above');
  });

  it('give the airflow that reaches the low end, Q = 0.5 m/s × 0.6 m² = 0.3 m³/s (common practice; [C])', () => {
    expect(benchHint(bench, { x_m: 4, y_m: 3, z_m: 0.9 })!.airflowForRange_m3PerS).toBeCloseTo(0.3, 12);
  });

  it('give no verdict when the source is outside the outline or more than 0.3 m above it (a judgement)', () => {
    expect(benchHint(bench, { x_m: 4.6, y_m: 3, z_m: 0.9 })).toMatchObject({ overSurface: false, verdict: null });
    expect(benchHint(bench, { x_m: 4, y_m: 3, z_m: 1.2 })).toMatchObject({ overSurface: false, verdict: null });
  });

  it('give no hint while the work surface or airflow is unusable', () => {
    expect(benchHint({ ...bench, faceHeight_m: 0 }, { x_m: 4, y_m: 3, z_m: 0.9 })).toBeNull();
    expect(benchHint({ ...bench, airflow_m3PerS: NaN }, { x_m: 4, y_m: 3, z_m: 0.9 })).toBeNull();
  });
});
