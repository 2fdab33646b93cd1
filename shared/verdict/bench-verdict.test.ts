import { describe, expect, it } from 'vitest';
import { judgeOptions } from './judge-options';
import { judgeRun, type RunNumbers } from './judge-run';

// A 1 m × 0.6 m work surface at 0.85 m with the source 0.05 m above its centre; face velocity Q/A against the
// downdraft-bench guidance of 0.5–1.0 m/s (common practice), whose half low end is 0.25 m/s.
const scenario = (faceVelocity_mPerS: number, source = { x_m: 4, y_m: 3, z_m: 0.9 }) => ({
  source,
  hoods: [
    {
      kind: 'downdraft-bench' as const,
      x_m: 4,
      y_m: 3,
      z_m: 0.85,
      direction: { x: 0, y: 0, z: 1 },
      faceWidth_m: 1,
      faceHeight_m: 0.6,
      airflow_m3PerS: faceVelocity_mPerS * 0.6,
    },
  ],
});
const LIMIT = { fraction: 'inhalable' as const, value_mgPerM3: 2 };
// Far below the limit and well resolved: on the numbers alone this run is Clear.
const low: RunNumbers = { twa8h_mgPerM3: 0.02, twa8hCi95_mgPerM3: [0.018, 0.022], zoneHistories: 5000, histories: 40_000 };

describe('the verdict on a downdraft bench', () => {
  it('is Clear on low numbers when the face velocity is within the guidance (common practice 0.5–1.0 m/s)', () => {
    expect(judgeRun(low, LIMIT, judgeOptions(scenario(0.7))).banner).toBe('clear');
  });

  it('stays Clear below the range but above half its low end: only under half keeps the banner from Clear', () => {
    expect(judgeOptions(scenario(0.3))).toEqual({ captureVelocity: 'below', captureBasis: 'face-velocity' });
    expect(judgeRun(low, LIMIT, judgeOptions(scenario(0.3))).banner).toBe('clear');
  });

  it('never gives Clear below half the low end (0.25 m/s, common practice), and says to measure', () => {
    for (const v of [0, 0.1, 0.2, 0.24]) {
      const verdict = judgeRun(low, LIMIT, judgeOptions(scenario(v)));
      expect(verdict.banner, `${v} m/s`).toBe('watch');
      expect(verdict.reasons).toEqual([expect.stringMatching(/face velocity is below half the lower end of the downdraft-bench guidance/)]);
    }
  });

  it('never gives Clear when the source is not over the work surface, however fast the face draws', () => {
    const aside = judgeOptions(scenario(1, { x_m: 5, y_m: 3, z_m: 0.9 }));
    expect(aside.captureVelocity).toBe('below-half');
    expect(judgeRun(low, LIMIT, aside).banner).toBe('watch');
    const high = judgeOptions(scenario(1, { x_m: 4, y_m: 3, z_m: 1.5 }));
    expect(judgeRun(low, LIMIT, high).banner).toBe('watch');
  });

  it('keeps Act where the numbers say Act', () => {
    const over: RunNumbers = { twa8h_mgPerM3: 3, twa8hCi95_mgPerM3: [2.9, 3.1], zoneHistories: 5000, histories: 40_000 };
    expect(judgeRun(over, LIMIT, judgeOptions(scenario(0.1))).banner).toBe('act');
  });
});
