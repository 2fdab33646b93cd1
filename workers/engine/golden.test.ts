import { describe, expect, it } from 'vitest';
import { parseScenario } from '../../shared/schemas/scenario';
import { combineBatches } from './combine';
import { runAll, testScenario } from './engine.test-helper';
import { prepareScenario } from './prepare';
import { workstation } from './workstation.test-helper';

// Seeded regression values (computed by this engine, not outside evidence). A change here means
// results changed for the same scenario and seed: bump ENGINE_VERSION and say why in the commit.
// Every part of the model is on: the release jet, young dust's growing diffusivity, collecting walls.
describe('golden regression, seed 2024', () => {
  it('reproduces the stored results', () => {
    const s = testScenario({
      ...workstation,
      room: { ...workstation.room, wallDeposition: true },
      source: { ...workstation.source, releaseType: 'active' },
      run: { particles: 1000, batches: 4, seed: 2024 },
    });
    const p = prepareScenario(parseScenario(s));
    const r = combineBatches(p, runAll(p));
    expect(r.performance.particleSteps).toBe(723082);
    expect(r.breathingZone.fractions.respirable.taskMean_mgPerM3).toBeCloseTo(0.27778747811337384, 12);
    expect(r.breathingZone.fractions.total.taskMean_mgPerM3).toBeCloseTo(0.8533234510869909, 12);
    expect(r.fate.captured).toBeCloseTo(0.300538409978315, 12);
    expect(r.fate.settled).toBeCloseTo(0.09795872277573338, 12);
    expect(r.fate.exhausted).toBeCloseTo(0.3110814675423721, 12);
    expect(r.fate.walls).toBeCloseTo(0, 12);
    expect(r.fate.airborne).toBeCloseTo(0.2902417109757003, 12);
  });
});
