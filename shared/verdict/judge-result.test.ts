import { describe, expect, it } from 'vitest';
import { agentLimit } from './agent-limit';
import { withVerdict } from './judge-result';

const summary = (twa: number, zoneHistories?: number) => ({
  taskMean_mgPerM3: twa,
  taskMeanCi95_mgPerM3: [twa * 0.9, twa * 1.1] as [number, number],
  twa8h_mgPerM3: twa,
  twa8hCi95_mgPerM3: [twa * 0.95, twa * 1.05] as [number, number],
  peak15min_mgPerM3: twa,
  zoneHistories,
});
const result = {
  engine: { version: '2.0.0', seed: 1, particles: 40_000, batches: 10, timeStep_s: 2, stepFraction: 0.5, sizeBins: 12 },
  breathingZone: {
    volume_m3: 0.1,
    fractions: { total: summary(1, 900), inhalable: summary(0.8, 900), thoracic: summary(0.3, 800), respirable: summary(0.16, 700) },
    series: {
      time_s: [],
      total: { mean: [], lo: [], hi: [] },
      inhalable: { mean: [], lo: [], hi: [] },
      thoracic: { mean: [], lo: [], hi: [] },
      respirable: { mean: [], lo: [], hi: [] },
    },
  },
  limit: {
    fraction: 'respirable' as const,
    value_mgPerM3: 0.025,
    percentOfLimit: -5,
    percentOfLimitUpper: -5,
    ratingCategory: 0 as const,
    banner: 'clear' as const,
  },
};

describe('withVerdict', () => {
  it('replaces a forged limit block with the judged one, for the limit’s own fraction', () => {
    const judged = withVerdict(result, { fraction: 'respirable', value_mgPerM3: 0.025 });
    // 0.16 mg/m³ respirable against 0.025 is 640 % ([C] 100 × 0.16 / 0.025).
    expect(judged.limit).toMatchObject({ banner: 'act', ratingCategory: 4, decided: true });
    expect(judged.limit!.percentOfLimit).toBeCloseTo(640, 9);
  });

  it('judges another fraction when the agent’s limit is set on it, and drops the block when there is no limit', () => {
    expect(withVerdict(result, { fraction: 'inhalable', value_mgPerM3: 10 }).limit).toMatchObject({
      fraction: 'inhalable',
      banner: 'clear',
    });
    expect(withVerdict(result, null)).not.toHaveProperty('limit');
  });
});

describe('agentLimit', () => {
  it('prefers the override to the published limit', () => {
    const data = { limitFraction: 'respirable' as const, limit8h_mgPerM3: 1, override: null };
    expect(agentLimit(data)).toEqual({ fraction: 'respirable', value_mgPerM3: 1 });
    expect(agentLimit({ ...data, override: { limit8h_mgPerM3: 0.1, reason: 'site policy' } }).value_mgPerM3).toBe(0.1);
  });
});
