import { describe, expect, it } from 'vitest';
import { HOOD_KINDS } from '../shared/vocabulary/hood-kinds';
import { prepareScenario, runBatch } from './engine/index';
import { WARM_UP_PARTICLES, warmUpPieces } from './warm-up-pieces';

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
