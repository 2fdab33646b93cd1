import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { parseScenario } from '../../shared/schemas/scenario';
import { cloneLikePostMessage, comparable, scenarioArb } from './random-scenario.test-helper';
import { prepareScenario } from './prepare';
import { runBatch } from './run-batch';
import type { BatchResult, PreparedScenario } from './types';

// Splitting and Russian roulette keep every tally's expectation (Kahn & Harris 1951; Booth 1985):
// the same random scenario with and without run.varianceReduction must agree within the batches'
// own standard errors. 4 combined standard errors over 20 batches a side (Student t, 38 df: two-sided
// p ≈ 3e-4 per comparison), so a real bias of that size fails, and a fixed fast-check seed keeps the
// verdict reproducible.
const BATCHES = 20;
const SE_ALLOWED = 4;

function stats(values: number[]): { mean: number; se: number } {
  const mean = values.reduce((a, v) => a + v, 0) / values.length;
  const variance = values.reduce((a, v) => a + (v - mean) ** 2, 0) / (values.length - 1);
  return { mean, se: Math.sqrt(variance / values.length) };
}

// The breathing-zone dose of every size, mg·s, and the captured mass, mg, per batch.
function perBatch(p: PreparedScenario, batches: BatchResult[]) {
  const n = p.bins.count;
  const dose = batches.map((b) => b.zoneResidence_s.reduce((a, s, k) => a + s * p.bins.particleMass_mg[k % n], 0));
  return {
    dose: stats(dose),
    captured: stats(batches.map((b) => b.fateMass_mg[0])),
    all: batches.map((b) => b.fateMass_mg.reduce((a, v) => a + v, 0)),
  };
}

function agree(a: { mean: number; se: number }, b: { mean: number; se: number }): boolean {
  const allowed = SE_ALLOWED * Math.hypot(a.se, b.se) + 1e-12 * Math.max(Math.abs(a.mean), Math.abs(b.mean));
  return Math.abs(a.mean - b.mean) <= allowed;
}

const runsArb = scenarioArb.chain((s) =>
  fc.record({
    scenario: fc.constant(s),
    particles: fc.integer({ min: 200, max: 400 }),
    seed: fc.integer(),
    duration_s: fc.double({ min: 20, max: 120, noNaN: true }),
  }),
);

let copies = 0;
let removed = 0;

describe('variance reduction (run.varianceReduction) over random valid scenarios (fast-check)', () => {
  it('agrees with the plain walk within error, keeps fates summing to the emission in expectation, counts source histories once, and stays bit-identical however batches are split among workers', () => {
    fc.assert(
      fc.property(runsArb, ({ scenario, particles, seed, duration_s }) => {
        const arm = (varianceReduction: boolean) =>
          prepareScenario(
            parseScenario({ ...scenario, run: { particles: particles * BATCHES, batches: BATCHES, seed, duration_s, varianceReduction } }),
          );
        const plain = arm(false);
        const reduced = arm(true);
        const plainBatches = Array.from({ length: BATCHES }, (_, k) => runBatch(plain, k));
        const reducedBatches = Array.from({ length: BATCHES }, (_, k) => runBatch(reduced, k));
        copies += reducedBatches.reduce((t, x) => t + x.splitCopies, 0);
        removed += reducedBatches.reduce((t, x) => t + x.rouletteRemoved, 0);
        expect(plainBatches.every((x) => x.splitCopies === 0 && x.rouletteRemoved === 0)).toBe(true);
        const a = perBatch(plain, plainBatches);
        const b = perBatch(reduced, reducedBatches);
        expect(agree(a.dose, b.dose), `zone dose ${a.dose.mean} ± ${a.dose.se} against ${b.dose.mean} ± ${b.dose.se}`).toBe(true);
        expect(
          agree(a.captured, b.captured),
          `captured ${a.captured.mean} ± ${a.captured.se} against ${b.captured.mean} ± ${b.captured.se}`,
        ).toBe(true);
        // The plain walk's fates sum to the simulated mass exactly; with roulette, in expectation.
        const simulated_mg = reduced.emission.emitted_mg * (1 - reduced.bins.massLeftOut.share);
        const sums = stats(b.all);
        expect(agree(sums, { mean: simulated_mg, se: 0 }), `fates ${sums.mean} ± ${sums.se} against ${simulated_mg}`).toBe(true);
        // Copies carry their source particle's id: a bin never has more zone histories than particles released.
        for (const batch of reducedBatches)
          batch.zoneHistories.forEach((h, bin) => expect(h).toBeLessThanOrEqual(reduced.bins.particlesPerBatch[bin]));
        const reference = comparable(reduced, reducedBatches);
        const cloned = cloneLikePostMessage(reduced);
        const shuffled = [1, 0].flatMap((w) =>
          Array.from({ length: BATCHES }, (_, k) => k)
            .filter((k) => k % 2 === w)
            .reverse()
            .map((k) => runBatch(cloned, k)),
        );
        expect(comparable(cloned, shuffled)).toBe(reference);
      }),
      { numRuns: 15, seed: 4321 },
    );
    // The comparison means something only if the scenarios did split and play roulette.
    expect(copies).toBeGreaterThan(100);
    expect(removed).toBeGreaterThan(100);
  });
});
