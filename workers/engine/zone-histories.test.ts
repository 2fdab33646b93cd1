import { describe, expect, it } from 'vitest';
import { combineBatches } from './combine';
import { prepareTest, runAll } from './engine.test-helper';
import { FRACTIONS } from './types';

describe('zoneHistories', () => {
  it('counts every particle when the source sits inside the breathing zone (each history starts there, by definition)', () => {
    const p = prepareTest({ worker: { x_m: 50, y_m: 50, z_m: 50 } });
    const r = combineBatches(p, runAll(p));
    expect(r.breathingZone.fractions.total.zoneHistories).toBe(r.engine.particles);
  });

  it('counts none when the zone is beyond reach: 69 m away against a diffusion length √(2Dt) of about 1 m in the run', () => {
    const p = prepareTest();
    expect(Math.sqrt(2 * p.eddyDiffusivity_m2PerS * p.duration_s)).toBeLessThan(1.2);
    const r = combineBatches(p, runAll(p));
    for (const f of FRACTIONS) expect(r.breathingZone.fractions[f].zoneHistories).toBe(0);
  });

  it('counts a particle once however long it stays: never more histories than particles, and the result sums the batches', () => {
    const p = prepareTest({ worker: { x_m: 50.4, y_m: 50, z_m: 50 } });
    const batches = runAll(p);
    const r = combineBatches(p, batches);
    const total = r.breathingZone.fractions.total.zoneHistories!;
    expect(total).toBeGreaterThan(0);
    expect(total).toBeLessThanOrEqual(r.engine.particles);
    expect(total).toBe(batches.reduce((a, b) => a + b.zoneHistories.reduce((x, v) => x + v, 0), 0));
  });
});
