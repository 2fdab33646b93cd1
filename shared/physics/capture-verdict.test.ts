import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseScenario } from '../schemas/scenario';
import { captureCheck, type CaptureHood } from './capture-verdict';

// physics.md §8 check hood: plain, A = 0.4 m × 0.25 m = 0.1 m², Q = 0.5 m³/s, facing +x from the origin.
const plain: CaptureHood = {
  kind: 'plain',
  x_m: 0,
  y_m: 0,
  z_m: 1,
  direction: { azimuth_deg: 0 },
  faceWidth_m: 0.4,
  faceHeight_m: 0.25,
  airflow_m3PerS: 0.5,
};
const at = (x_m: number, releaseType: 'quiet' | 'low' | 'active' | 'high' = 'low') => ({
  source: { x_m, y_m: 0, z_m: 1, releaseType },
  hoods: [plain],
});

describe('capture-velocity verdict', () => {
  it("gives the stone bench demo 0.47 m/s against grinding's 2.5–10 m/s, under half of it (issue 14; [C] 0.35/(0.75·(10·0.3² + 0.0875)))", () => {
    const demo = parseScenario(JSON.parse(readFileSync(new URL('../demo-scenarios/default.json', import.meta.url), 'utf8')));
    const check = captureCheck(demo)!;
    expect(check.speedAtSource_mPerS).toBeCloseTo(0.4726, 3);
    expect(check.verdict).toBe('below-half');
    expect(check.sentence).toBe(
      '0.47 m/s at the source; a high-velocity release (flung out fast into very fast-moving air) needs 2.5–10 m/s (less than half the low end).',
    );
  });

  it('reads the centre-line speeds of physics.md §8 (2.50, 1.00, 0.50, 0.192 m/s) against the ACGIH ranges [C][S]', () => {
    expect(captureCheck(at(0.2))!).toMatchObject({ verdict: 'within' });
    expect(captureCheck(at(0.2))!.speedAtSource_mPerS).toBeCloseTo(1.0, 9);
    expect(captureCheck(at(0.1))!.verdict).toBe('above');
    expect(captureCheck(at(0.5))!.verdict).toBe('below-half');
    // 0.50 m/s is exactly half of the active range's 1.0 m/s low end: below it, not under half.
    expect(captureCheck(at(0.3, 'active'))!.verdict).toBe('below');
    expect(captureCheck(at(0.3, 'active'))!.range).toMatchObject({ min_mPerS: 1, max_mPerS: 2.5 });
  });

  it('counts a source behind the face as reached by nothing', () => {
    const check = captureCheck(at(-0.2))!;
    expect(check).toMatchObject({ behind: true, speedAtSource_mPerS: 0, verdict: 'below-half' });
    expect(check.sentence).toContain('behind the hood face');
  });

  it('takes the hood that draws fastest at the source', () => {
    const weak = { ...plain, airflow_m3PerS: 0.1 };
    expect(captureCheck({ source: at(0.2).source, hoods: [weak, plain] })!.hoodIndex).toBe(1);
  });

  it('says nothing without a release type or a hood', () => {
    expect(captureCheck({ source: { x_m: 0.2, y_m: 0, z_m: 1 }, hoods: [plain] })).toBeNull();
    expect(captureCheck({ source: at(0.2).source, hoods: [] })).toBeNull();
  });
});
