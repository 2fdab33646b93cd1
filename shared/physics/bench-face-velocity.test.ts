import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseScenario } from '../schemas/scenario';
import { BENCH_FACE_VELOCITY, BENCH_REACH_ABOVE_m, benchFaceCheck } from './bench-face-velocity';
import { captureCheck, type CaptureHood } from './capture-verdict';

// A 1.2 m × 0.5 m = 0.6 m² work surface at 0.85 m; Q = 0.372 m³/s gives Q/A = 0.62 m/s [C].
const bench: CaptureHood = {
  kind: 'downdraft-bench',
  x_m: 2,
  y_m: 1,
  z_m: 0.85,
  direction: { x: 0, y: 0, z: 1 },
  faceWidth_m: 1.2,
  faceHeight_m: 0.5,
  airflow_m3PerS: 0.372,
};
const above = (dz_m: number, dx_m = 0, dy_m = 0) => ({ x_m: 2 + dx_m, y_m: 1 + dy_m, z_m: 0.85 + dz_m });
const withFaceVelocity = (v_mPerS: number) => ({ ...bench, airflow_m3PerS: v_mPerS * 0.6 });
const check = (hood: CaptureHood, source = above(0.1), releaseType?: 'quiet' | 'low' | 'active' | 'high') =>
  captureCheck({ source: { ...source, releaseType }, hoods: [hood] })!;

describe('downdraft-bench face-velocity check', () => {
  // Common practice, no published source: 0.5–1.0 m/s averaged over the open work surface.
  it('holds the 0.5–1.0 m/s common-practice range and the 0.3 m reach above the surface (a judgement)', () => {
    expect([BENCH_FACE_VELOCITY.min_mPerS, BENCH_FACE_VELOCITY.max_mPerS]).toEqual([0.5, 1.0]);
    expect(BENCH_REACH_ABOVE_m).toBe(0.3);
  });

  it('reads Q/A over the work surface: 0.62 m/s, within the 0.5–1.0 m/s range (common practice; [C] 0.372/(1.2·0.5))', () => {
    const c = check(bench);
    expect(c.speedAtSource_mPerS).toBeCloseTo(0.62, 12);
    expect(c).toMatchObject({ basis: 'face-velocity', verdict: 'within', offSurface: false, behind: false, hoodIndex: 0 });
    expect(c.sentence).toBe(
      '0.62 m/s over the work surface; downdraft benches need 0.50–1.0 m/s (common practice; within the range). Confirm against local guidance.',
    );
  });

  it('grades the face velocity against 0.5–1.0 m/s with half the low end, 0.25 m/s, as the floor (common practice)', () => {
    expect(check(withFaceVelocity(1.2)).verdict).toBe('above');
    expect(check(withFaceVelocity(1.0)).verdict).toBe('within');
    expect(check(withFaceVelocity(0.5)).verdict).toBe('within');
    expect(check(withFaceVelocity(0.4)).verdict).toBe('below');
    // Exactly half the low end is below the range, not under half of it.
    expect(check(withFaceVelocity(0.25)).verdict).toBe('below');
    expect(check(withFaceVelocity(0.24)).verdict).toBe('below-half');
    expect(check(withFaceVelocity(0.24)).sentence).toBe(
      '0.24 m/s over the work surface; downdraft benches need 0.50–1.0 m/s (common practice; less than half the low end). Confirm against local guidance.',
    );
  });

  it('does not depend on the release type, and needs none', () => {
    for (const release of [undefined, 'quiet', 'high'] as const) expect(check(bench, above(0.1), release).range.min_mPerS).toBe(0.5);
  });

  it('counts a source outside the outline, below the surface or more than 0.3 m above it as reached by nothing (a judgement)', () => {
    for (const source of [above(0.1, 0.61), above(0.1, 0, -0.26), above(-0.05), above(0.31)]) {
      const c = check(bench, source);
      expect(c).toMatchObject({ offSurface: true, speedAtSource_mPerS: 0, verdict: 'below-half' });
      expect(c.sentence).toBe(
        "The source is not over the work surface (inside its outline, at most 0.3 m above it), so the bench's face-velocity guidance does not apply and counts as no speed; downdraft benches need 0.50–1.0 m/s (common practice; less than half the low end). Confirm against local guidance.",
      );
    }
  });

  it('counts a source on the edge of the outline, on the surface or exactly 0.3 m above it as over the surface', () => {
    for (const source of [above(0.1, 0.6), above(0.1, -0.6, 0.25), above(0), above(0.3)]) {
      expect(benchFaceCheck(bench, source).overSurface).toBe(true);
    }
  });

  it('takes, among hoods on different ranges, the one with the larger share of its own low end', () => {
    // [C] physics.md §8: a plain 0.1 m² opening at Q = 0.5 m³/s gives 1.00 m/s at 0.2 m, 0.4 of the 2.5 m/s high-release low end.
    const plain: CaptureHood = {
      ...bench,
      kind: 'plain',
      x_m: 1.8,
      z_m: 0.95,
      direction: { azimuth_deg: 0 },
      faceWidth_m: 0.4,
      faceHeight_m: 0.25,
      airflow_m3PerS: 0.5,
    };
    const source = { x_m: 2, y_m: 1, z_m: 0.95, releaseType: 'high' as const };
    expect(captureCheck({ source, hoods: [plain, bench] })).toMatchObject({ hoodIndex: 1, basis: 'face-velocity', verdict: 'within' });
    expect(captureCheck({ source, hoods: [plain, withFaceVelocity(0.15)] })).toMatchObject({
      hoodIndex: 0,
      basis: 'centre-line',
      verdict: 'below-half',
    });
  });

  it('gives the joinery demo bench 1.0 m/s over its 1.0 m × 0.6 m surface, within the range ([C] 0.6/0.6; common practice)', () => {
    const demo = parseScenario(
      JSON.parse(readFileSync(new URL('../demo-scenarios/joinery-sander-downdraft-bench.json', import.meta.url), 'utf8')),
    );
    expect(demo.hoods[0]).toMatchObject({ kind: 'downdraft-bench', direction: { x: 0, y: 0, z: 1 } });
    expect(captureCheck(demo)).toMatchObject({ speedAtSource_mPerS: 1, verdict: 'within', basis: 'face-velocity' });
  });
});
