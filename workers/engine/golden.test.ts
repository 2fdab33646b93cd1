import { describe, expect, it } from 'vitest';
import { combineBatches } from './combine.ts';
import { prepareTest, runAll } from './engine.test-helper.ts';
import { workstation } from './workstation.test-helper.ts';

// Seeded regression values (computed by this engine, not outside evidence). A change here means
// results changed for the same scenario and seed: bump ENGINE_VERSION and say why in the commit.
describe('golden regression, seed 2024', () => {
  it('reproduces the stored results', () => {
    const p = prepareTest({ ...workstation, run: { particles: 1000, batches: 4, seed: 2024 } });
    const r = combineBatches(p, runAll(p));
    expect(r.performance.particleSteps).toBe(284565);
    expect(r.breathingZone.fractions.respirable.taskMean_mgPerM3).toBeCloseTo(0.06836896224266416, 12);
    expect(r.breathingZone.fractions.total.taskMean_mgPerM3).toBeCloseTo(0.16623244928460185, 12);
    expect(r.fate.captured).toBeCloseTo(0.5814615548371118, 12);
    expect(r.fate.settled).toBeCloseTo(0.1224811773932701, 12);
    expect(r.fate.exhausted).toBeCloseTo(0.15064025770582998, 12);
  });
});
