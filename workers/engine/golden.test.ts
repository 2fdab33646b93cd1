import { describe, expect, it } from 'vitest';
import { combineBatches } from './combine';
import { prepareTest, runAll } from './engine.test-helper';
import { workstation } from './workstation.test-helper';

// Seeded regression values (computed by this engine, not outside evidence). A change here means
// results changed for the same scenario and seed: bump ENGINE_VERSION and say why in the commit.
describe('golden regression, seed 2024', () => {
  it('reproduces the stored results', () => {
    const p = prepareTest({ ...workstation, run: { particles: 1000, batches: 4, seed: 2024 } });
    const r = combineBatches(p, runAll(p));
    expect(r.performance.particleSteps).toBe(292859);
    expect(r.breathingZone.fractions.respirable.taskMean_mgPerM3).toBeCloseTo(0.0685035140919163, 12);
    expect(r.breathingZone.fractions.total.taskMean_mgPerM3).toBeCloseTo(0.19700555915126225, 12);
    expect(r.fate.captured).toBeCloseTo(0.5825999649132647, 12);
    expect(r.fate.settled).toBeCloseTo(0.10782980115544805, 12);
    expect(r.fate.exhausted).toBeCloseTo(0.16544075659427648, 12);
  });
});
