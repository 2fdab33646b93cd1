import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { parseScenario } from '../../shared/schemas/scenario';
import { combineBatches } from './combine';
import { prepareScenario } from './prepare';
import { runBatch } from './run-batch';
import { cloneLikePostMessage, comparable, scenarioArb } from './random-scenario.test-helper';

describe('engine invariants over random valid scenarios (fast-check)', () => {
  it('conserves mass, keeps particles in the room, and ignores how batches are split among workers', () => {
    fc.assert(
      fc.property(scenarioArb, (input) => {
        const p = prepareScenario(parseScenario(input));
        p.keepParticles = true;
        const ordered = Array.from({ length: p.batches }, (_, k) => runBatch(p, k));
        for (const b of ordered) {
          const fate = b.fateMass_mg.reduce((a, v) => a + v, 0);
          // Particles carry the simulated sizes only; the mass outside them is left out, not renormalised in.
          const simulated_mg = p.emission.emitted_mg * (1 - p.bins.massLeftOut.share);
          expect(Math.abs(fate - simulated_mg)).toBeLessThan(1e-9 * Math.max(1, p.emission.emitted_mg));
          const s = b.particles!;
          for (let i = 0; i < s.x.length; i++) {
            expect(
              s.x[i] >= 0 &&
                s.x[i] <= p.room.length_m &&
                s.y[i] >= 0 &&
                s.y[i] <= p.room.width_m &&
                s.z[i] >= 0 &&
                s.z[i] <= p.room.height_m,
            ).toBe(true);
          }
        }
        const { fate, massLeftOut } = combineBatches(p, ordered);
        expect(fate.captured + fate.settled + fate.exhausted + fate.airborne + massLeftOut!.share).toBeCloseTo(1, 12);
        // A worker receives a structured clone; 1, 2 and 3 workers: each takes batches round-robin and finishes in its own order.
        const reference = comparable(p, ordered);
        for (const workers of [2, 3]) {
          const cloned = cloneLikePostMessage(p);
          const byWorker = Array.from({ length: workers }, (_, w) =>
            Array.from({ length: p.batches }, (_, k) => k)
              .filter((k) => k % workers === w)
              .reverse(),
          );
          const shuffled = byWorker.flatMap((ks) => ks.map((k) => runBatch(cloned, k)));
          expect(comparable(cloned, shuffled)).toBe(reference);
        }
      }),
      { numRuns: 25, seed: 1234 },
    );
  });
});
