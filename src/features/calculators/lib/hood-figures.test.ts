import { describe, expect, it } from 'vitest';
import { hoodCalculatorSchema } from '../../../../shared/schemas/calculators';
import { hoodFigures } from './hood-figures';

const plain = { kind: 'plain' as const, width_m: Math.sqrt(0.1), height_m: Math.sqrt(0.1), release: 'low' as const };

describe('hood figures for the calculator page', () => {
  // [C] physics.md §8: plain A = 0.1 m², Q = 0.5 m³/s gives 2.50, 1.00, 0.50, 0.192 m/s at 0.1, 0.2, 0.3, 0.5 m.
  it.each([
    [0.1, 2.5],
    [0.2, 1.0],
    [0.3, 0.5],
    [0.5, 0.192],
  ])('gives the plain-opening centre-line velocity at %s m as %s m/s ([C] physics.md §8)', (x, v) => {
    const f = hoodFigures({ ...plain, distance_m: x, basis: 'airflow', airflow: 1800, airflowUnit: 'm3PerH' });
    expect(f.centerline_mPerS).toBeCloseTo(v, 3);
  });

  it('calls 1.00 m/s within the 0.5–1.0 m/s low-release range ([S] ACGIH capture-velocity table)', () => {
    expect(hoodFigures({ ...plain, distance_m: 0.2, basis: 'airflow', airflow: 0.5, airflowUnit: 'm3PerS' }).verdict).toBe('within');
  });

  // [C] Q = V·(10X² + A) = 1·(0.4 + 0.1); duct d = √(4Q/(πv)) at 20 and 18 m/s ([S] ACGIH 18–20 m/s).
  it('finds the airflow for a capture velocity and the duct that carries it at 18–20 m/s', () => {
    const f = hoodFigures({ ...plain, distance_m: 0.2, basis: 'capture', captureVelocity_mPerS: 1 });
    expect(f.airflow_m3PerS).toBeCloseTo(0.5, 9);
    expect(f.ductDiameter_m.min).toBeCloseTo(Math.sqrt(2 / (Math.PI * 20)), 9);
    expect(f.ductDiameter_m.max).toBeCloseTo(Math.sqrt(2 / (Math.PI * 18)), 9);
  });

  // [M] valid to about 1.5 hood diameters, D = √(4A/π): 0.535 m for A = 0.1 m².
  it('flags distances beyond 1.5 equivalent hood diameters', () => {
    const near = hoodFigures({ ...plain, distance_m: 0.5, basis: 'capture', captureVelocity_mPerS: 1 });
    const far = hoodFigures({ ...plain, distance_m: 0.6, basis: 'capture', captureVelocity_mPerS: 1 });
    expect(near.validUpTo_m).toBeCloseTo(0.535, 3);
    expect([near.beyondValidity, far.beyondValidity]).toEqual([false, true]);
  });

  it('takes the long side as the slot length and warns when a square face is called a slot', () => {
    const f = hoodFigures({
      kind: 'slot',
      width_m: 1,
      height_m: 0.05,
      distance_m: 0.1,
      release: 'low',
      basis: 'capture',
      captureVelocity_mPerS: 1,
    });
    expect(f.airflow_m3PerS).toBeCloseTo(3.7 * 1 * 0.1, 9);
    expect(f.aspectMismatch).toBe(false);
    expect(hoodFigures({ ...plain, kind: 'slot', distance_m: 0.1, basis: 'capture', captureVelocity_mPerS: 1 }).aspectMismatch).toBe(true);
  });
});

describe('hood calculator kinds', () => {
  it('leaves the downdraft bench out, saying plainly what covers it instead', () => {
    const input = { width_m: 1, height_m: 0.6, distance_m: 0.1, release: 'low', basis: 'airflow', airflow: 0.6, airflowUnit: 'm3PerS' };
    const parsed = hoodCalculatorSchema.safeParse({ ...input, kind: 'downdraft-bench' });
    expect(parsed.success).toBe(false);
    expect(parsed.error!.issues).toEqual([
      expect.objectContaining({
        path: ['kind'],
        message: 'The hood calculator covers openings, slots and booths; a downdraft bench is checked by its face velocity in a scenario',
      }),
    ]);
    expect(hoodCalculatorSchema.safeParse({ ...input, kind: 'flanged' }).success).toBe(true);
  });
});
