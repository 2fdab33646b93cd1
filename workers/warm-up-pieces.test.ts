import { describe, expect, it } from 'vitest';
import { HOOD_KINDS } from '../shared/vocabulary/hood-kinds';
import { prepareScenario, runBatch } from './engine/index';
import { referenceScenario } from './engine/reference-scenario';
import { parseScenario } from '../shared/schemas/scenario';
import { OWN_WARM_UP_BATCHES, OWN_WARM_UP_PARTICLES, ownWarmUpPiece, WARM_UP_PARTICLES, warmUpPieces } from './warm-up-pieces';

describe('the pieces a fresh worker warms up on', () => {
  const pieces = warmUpPieces();

  it('take every hood kind, no hood, both kinds of emission, a release jet and a limit', () => {
    const kinds = new Set(pieces.flatMap((s) => s.hoods.map((h) => h.kind)));
    expect([...kinds].sort()).toEqual([...HOOD_KINDS].sort());
    expect(pieces.some((s) => s.hoods.length === 0)).toBe(true);
    expect(new Set(pieces.map((s) => s.source.emission.kind))).toEqual(new Set(['continuous', 'bursts']));
    expect(pieces.every((s) => s.source.jet && s.limit && s.run.varianceReduction)).toBe(true);
  });

  it('each run one small batch, the first of two', () => {
    for (const s of pieces) {
      expect(s.run).toMatchObject({ particles: 2 * WARM_UP_PARTICLES, batches: 2 });
      const b = runBatch(prepareScenario(s), 0);
      expect(b.particleSteps).toBeGreaterThan(1000);
    }
    // The bench piece's source sits over its work surface, as the verdict's bench check wants.
    const bench = pieces.find((s) => s.hoods[0]?.kind === 'downdraft-bench')!;
    const h = bench.hoods[0];
    expect(Math.abs(bench.source.x_m - h.x_m)).toBeLessThan(h.faceWidth_m / 2);
    expect(Math.abs(bench.source.y_m - h.y_m)).toBeLessThan(h.faceHeight_m / 2);
  });
});

describe("the page's own scenario as a warm-up", () => {
  const own = parseScenario({
    ...referenceScenario,
    room: { ...referenceScenario.room, wallDeposition: true },
    run: {
      ...referenceScenario.run,
      particles: 5000,
      batches: 20,
      seed: 'ticket-7',
      precision: { relativeHalfWidth: 0.1, maxBatches: 160 },
    },
  });
  const piece = ownWarmUpPiece(own);

  it('keeps what decides the step loop’s branches and drops the rule', () => {
    expect(piece.hoods).toEqual(own.hoods);
    expect(piece.source).toEqual(own.source);
    expect(piece.room).toEqual(own.room);
    expect(piece.limit).toEqual(own.limit);
    expect(piece.run.varianceReduction).toBe(own.run.varianceReduction);
    expect(piece.run.precision).toBeUndefined();
  });

  it('runs a few small batches of its own seed, never the run’s', () => {
    expect(piece.run).toMatchObject({
      particles: OWN_WARM_UP_BATCHES * OWN_WARM_UP_PARTICLES,
      batches: OWN_WARM_UP_BATCHES,
      seed: 'warm-up',
    });
    const p = prepareScenario(piece);
    expect(p.particlesPerBatch).toBe(OWN_WARM_UP_PARTICLES);
    expect(runBatch(p, OWN_WARM_UP_BATCHES - 1).particleSteps).toBeGreaterThan(1000);
  });
});
