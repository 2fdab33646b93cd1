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
    expect(r.performance.particleSteps).toBe(287371);
    expect(r.breathingZone.fractions.respirable.taskMean_mgPerM3).toBeCloseTo(0.07063781455272079, 12);
    expect(r.breathingZone.fractions.total.taskMean_mgPerM3).toBeCloseTo(0.17237754093982294, 12);
    expect(r.fate.captured).toBeCloseTo(0.5913316405633594, 12);
    expect(r.fate.settled).toBeCloseTo(0.1353863529413842, 12);
    expect(r.fate.exhausted).toBeCloseTo(0.1263884210963234, 12);
  });
});
