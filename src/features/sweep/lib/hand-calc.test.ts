import { describe, expect, it } from 'vitest';
import type { Hood } from '../../../../shared/schemas/scenario';
import { benchHandCalcSentence, handCalcAnswer, handCalcCovers, HOOD_EQUATION } from './hand-calc';

// [C] physics.md §8 check values: a plain opening of A = 0.1 m² drawing Q = 0.5 m³/s gives
// V(0.1, 0.2, 0.3, 0.5 m) = 2.50, 1.00, 0.50, 0.192 m/s on its centre line.
const plain: Hood = {
  kind: 'plain',
  x_m: 1,
  y_m: 1,
  z_m: 1,
  direction: { azimuth_deg: 0, elevation_deg: 0 },
  faceWidth_m: 0.4,
  faceHeight_m: 0.25,
  airflow_m3PerS: 0.5,
};

describe('hand-calculation answer (Dalla Valle / ACGIH)', () => {
  it('needs 0.5 m³/s for 1.0 m/s (active generation, low end) at 0.2 m from a plain 0.1 m² opening [C]', () => {
    const a = handCalcAnswer(plain, 0.2, 'active', 'airflow');
    expect(a).toMatchObject({ kind: 'airflow', captureVelocity_mPerS: 1, airflow_m3PerS: expect.closeTo(0.5, 12) });
  });

  it('finds where the centre-line velocity of 0.5 m³/s falls to the capture velocity [C]', () => {
    const at = (release: 'active' | 'low' | 'high') => {
      const a = handCalcAnswer(plain, 0.2, release, 'distance');
      return a.kind === 'distance' ? a.distance_m : NaN;
    };
    expect(at('active')).toBeCloseTo(0.2, 9); // 1.00 m/s at 0.2 m
    expect(at('low')).toBeCloseTo(0.3, 9); // 0.50 m/s at 0.3 m
    expect(at('high')).toBeCloseTo(0.1, 9); // 2.50 m/s at 0.1 m
  });

  it('gives no distance when the face velocity is already below the capture velocity', () => {
    expect(handCalcAnswer({ ...plain, airflow_m3PerS: 0.2 }, 0.2, 'high', 'distance')).toMatchObject({ distance_m: null });
  });

  it('applies the flange factor 0.75 and the slot equation', () => {
    const flanged = handCalcAnswer({ ...plain, kind: 'flanged' }, 0.2, 'active', 'airflow');
    expect(flanged).toMatchObject({ kind: 'airflow', airflow_m3PerS: expect.closeTo(0.375, 12) });
    // Q = 3.7 L V X with the face width as slot length: 3.7 × 1 m × 1 m/s × 0.2 m.
    const slot = handCalcAnswer({ ...plain, kind: 'slot', faceWidth_m: 1, faceHeight_m: 0.05 }, 0.2, 'active', 'airflow');
    expect(slot).toMatchObject({ kind: 'airflow', airflow_m3PerS: expect.closeTo(0.74, 12) });
  });

  it('finds the largest face that still gives the capture velocity at the source [C]', () => {
    // At 0.5 m³/s and 0.2 m, V = 1 m/s needs 10 X² + A ≤ 0.5, so A ≤ 0.1 m²: the current face, scale 1.
    const a = handCalcAnswer(plain, 0.2, 'active', 'faceScale');
    expect(a).toMatchObject({ kind: 'faceScale', faceScale: expect.closeTo(1, 9) });
    expect(handCalcAnswer(plain, 0.3, 'active', 'faceScale')).toMatchObject({ faceScale: null });
  });

  it('quotes the equations of the hood-types figure (ACGIH Industrial Ventilation; Dalla Valle) [S]', () => {
    expect(HOOD_EQUATION).toEqual({
      plain: 'Q = V (10 X² + A)',
      flanged: 'Q = 0.75 V (10 X² + A)',
      slot: 'Q = 3.7 L V X',
      'flanged-slot': 'Q = 2.6 L V X',
      booth: 'Q = V W H',
    });
  });
});

describe('hand calculation and a downdraft bench', () => {
  const bench: Hood = {
    ...plain,
    kind: 'downdraft-bench',
    direction: { x: 0, y: 0, z: 1 },
    faceWidth_m: 1.2,
    faceHeight_m: 0.5,
    airflow_m3PerS: 0.372,
  };

  it('covers every kind but the downdraft bench with the centre-line equations', () => {
    expect(handCalcCovers('downdraft-bench')).toBe(false);
    for (const kind of Object.keys(HOOD_EQUATION) as Hood['kind'][]) expect(handCalcCovers(kind)).toBe(true);
  });

  it('quotes the bench face velocity Q/A instead: 0.62 m/s against 0.5–1.0 m/s (common practice; [C] 0.372/(1.2·0.5))', () => {
    expect(benchHandCalcSentence(bench)).toBe(
      'The centre-line hand calculation covers capturing hoods, slots and booths, not a downdraft bench. A bench is checked by its face velocity over the work surface instead: 0.62 m/s here, against 0.50–1.0 m/s for downdraft benches (common practice; confirm against local guidance). It does not change with the distance, but holds only while the source is over the work surface, at most 0.3 m above it.',
    );
  });
});
