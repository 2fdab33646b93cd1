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
  it('reproduces the stored results of the plain walk (run.varianceReduction false)', () => {
    const s = testScenario({
      ...workstation,
      room: { ...workstation.room, wallDeposition: true },
      source: { ...workstation.source, releaseType: 'active' },
      run: { particles: 1000, batches: 4, seed: 2024, varianceReduction: false },
    });
    const p = prepareScenario(parseScenario(s));
    const r = combineBatches(p, runAll(p));
    expect(r.performance.particleSteps).toBe(722682);
    expect(r.breathingZone.fractions.respirable.taskMean_mgPerM3).toBeCloseTo(0.2770015306289312, 12);
    expect(r.breathingZone.fractions.total.taskMean_mgPerM3).toBeCloseTo(0.8753687222498769, 12);
    expect(r.fate.captured).toBeCloseTo(0.26565777229369475, 12);
    expect(r.fate.settled).toBeCloseTo(0.09944889909313483, 12);
    expect(r.fate.exhausted).toBeCloseTo(0.33434403757302567, 12);
    expect(r.fate.walls).toBeCloseTo(0, 12);
    expect(r.fate.airborne).toBeCloseTo(0.3003696023122655, 12);
  });

  it('reproduces the stored results with variance reduction (the default), a respirable limit steering the size allocation', () => {
    const s = testScenario({
      ...workstation,
      room: { ...workstation.room, wallDeposition: true },
      source: { ...workstation.source, releaseType: 'active' },
      limit: { fraction: 'respirable', value_mgPerM3: 0.1 },
      run: { particles: 1000, batches: 4, seed: 2024 },
    });
    const p = prepareScenario(parseScenario(s));
    const batches = runAll(p);
    const r = combineBatches(p, batches);
    expect(r.performance.particleSteps).toBe(854881);
    expect(batches.reduce((a, b) => a + b.splitCopies, 0)).toBe(1256);
    expect(batches.reduce((a, b) => a + b.rouletteRemoved, 0)).toBe(1267);
    expect(r.breathingZone.fractions.respirable.taskMean_mgPerM3).toBeCloseTo(0.2720388927328442, 12);
    expect(r.breathingZone.fractions.total.taskMean_mgPerM3).toBeCloseTo(0.8671417294072307, 12);
    expect(r.fate.captured).toBeCloseTo(0.28379578415665113, 12);
    expect(r.fate.settled).toBeCloseTo(0.09184655385829102, 12);
    expect(r.fate.exhausted).toBeCloseTo(0.323353328848657, 12);
    expect(r.fate.airborne).toBeCloseTo(0.30209249903390245, 12);
  });
});
