import { describe, it, expect } from 'vitest';
import { captureVelocityRange, hoodCenterlineVelocity, hoodFace, hoodRequiredAirflow } from './index';

describe('hoodCenterlineVelocity', () => {
  it.each([
    [0.1, 2.5],
    [0.2, 1.0],
    [0.3, 0.5],
    [0.5, 0.192],
  ])('gives %s m in front of a plain 0.1 m² opening drawing 0.5 m³/s a speed of %s m/s ([C] Dalla Valle / ACGIH)', (x_m, v_mPerS) => {
    const v = hoodCenterlineVelocity({ kind: 'plain', faceArea_m2: 0.1, airflow_m3PerS: 0.5 }, x_m);
    expect(Math.abs(v / v_mPerS - 1)).toBeLessThan(0.005);
  });

  it('needs only 75 % of the airflow with a flange, so the same airflow reaches a third further in speed ([S] ACGIH)', () => {
    const plain = hoodCenterlineVelocity({ kind: 'plain', faceArea_m2: 0.1, airflow_m3PerS: 0.5 }, 0.3);
    const flanged = hoodCenterlineVelocity({ kind: 'flanged', faceArea_m2: 0.1, airflow_m3PerS: 0.5 }, 0.3);
    expect(flanged / plain).toBeCloseTo(4 / 3, 12);
  });

  it('uses Q/(3.7·L·X) for a slot and Q/(2.6·L·X) for a flanged slot ([S] ACGIH)', () => {
    const slot = { faceArea_m2: 0.05, slotLength_m: 1, airflow_m3PerS: 0.74 };
    expect(hoodCenterlineVelocity({ kind: 'slot', ...slot }, 0.2)).toBeCloseTo(1, 12);
    expect(hoodCenterlineVelocity({ kind: 'flanged-slot', ...slot }, 0.2)).toBeCloseTo(0.74 / 0.52, 12);
  });

  it('gives a booth its face velocity Q/(W·H) at any distance ([S] ACGIH)', () => {
    const booth = { kind: 'booth' as const, faceArea_m2: 2, airflow_m3PerS: 1 };
    expect(hoodCenterlineVelocity(booth, 0)).toBe(0.5);
    expect(hoodCenterlineVelocity(booth, 1)).toBe(0.5);
  });

  it('caps the speed at the face velocity Q/A, where the fitted slot equation would diverge', () => {
    const slot = { kind: 'slot' as const, faceArea_m2: 0.05, slotLength_m: 1, airflow_m3PerS: 0.5 };
    expect(hoodCenterlineVelocity(slot, 0)).toBe(10);
    expect(hoodCenterlineVelocity(slot, 0.001)).toBe(10);
  });

  it('rejects a slot without a length and a negative distance, naming the argument', () => {
    expect(() => hoodCenterlineVelocity({ kind: 'slot', faceArea_m2: 0.05, airflow_m3PerS: 0.5 }, 0.1)).toThrow(/slotLength_m.*NaN/);
    expect(() => hoodCenterlineVelocity({ kind: 'plain', faceArea_m2: 0.1, airflow_m3PerS: 0.5 }, -0.1)).toThrow(/distance_m.*-0.1/);
  });

  it('rejects an unknown hood kind, quoting it', () => {
    // @ts-expect-error the type forbids it; the runtime check guards untyped callers
    expect(() => hoodCenterlineVelocity({ kind: 'canopy', faceArea_m2: 0.1, airflow_m3PerS: 0.5 }, 0.1)).toThrow(/canopy/);
  });
});

describe('hoodRequiredAirflow', () => {
  it('asks 0.5 m³/s of a plain 0.1 m² opening to reach 0.5 m/s at 0.3 m ([C] Dalla Valle / ACGIH)', () => {
    expect(hoodRequiredAirflow({ kind: 'plain', faceArea_m2: 0.1 }, 0.5, 0.3)).toBeCloseTo(0.5, 12);
  });

  it('is inverted by hoodCenterlineVelocity for every hood kind, near the face included', () => {
    for (const kind of ['plain', 'flanged', 'slot', 'flanged-slot', 'booth'] as const) {
      for (const x_m of [0.01, 0.1, 0.4]) {
        const geometry = { kind, faceArea_m2: 0.08, slotLength_m: 0.8 };
        const airflow_m3PerS = hoodRequiredAirflow(geometry, 0.75, x_m);
        expect(hoodCenterlineVelocity({ ...geometry, airflow_m3PerS }, x_m)).toBeCloseTo(0.75, 12);
      }
    }
  });
});

describe('captureVelocityRange', () => {
  it.each([
    ['quiet', 0.25, 0.5],
    ['low', 0.5, 1.0],
    ['active', 1.0, 2.5],
    ['high', 2.5, 10],
  ] as const)('gives %s release %s–%s m/s ([S] ACGIH capture-velocity table)', (release, min, max) => {
    const range = captureVelocityRange(release);
    expect([range.min_mPerS, range.max_mPerS]).toEqual([min, max]);
    expect(range.examples.length).toBeGreaterThan(0);
  });

  it('names grinding as a high-velocity release ([S] ACGIH)', () => {
    expect(captureVelocityRange('high').examples).toContain('grinding');
  });

  it('hands out a copy, so a caller cannot change the table', () => {
    const range = captureVelocityRange('low');
    (range.examples as string[]).push('spraying');
    range.min_mPerS = 99;
    expect(captureVelocityRange('low').min_mPerS).toBe(0.5);
    expect(captureVelocityRange('low').examples).not.toContain('spraying');
  });

  it('rejects an unknown release, quoting it', () => {
    // @ts-expect-error the type forbids it; the runtime check guards untyped callers
    expect(() => captureVelocityRange('toString')).toThrow(/toString/);
  });
});

describe('a downdraft bench as a flanged opening facing up (the work surface is its flange)', () => {
  it('has the flanged centre line Q/(0.75·(10·X² + A)) above its surface ([S] ACGIH hood-types figure)', () => {
    for (const x_m of [0, 0.05, 0.3, 1]) {
      const geometry = { faceArea_m2: 0.6, airflow_m3PerS: 0.6 };
      expect(hoodCenterlineVelocity({ kind: 'downdraft-bench', ...geometry }, x_m)).toBe(
        hoodCenterlineVelocity({ kind: 'flanged', ...geometry }, x_m),
      );
    }
    // [C] 0.6/(0.75·(10·0.3² + 0.6)) = 0.533 m/s at 0.3 m above a 0.6 m² surface.
    expect(hoodCenterlineVelocity({ kind: 'downdraft-bench', faceArea_m2: 0.6, airflow_m3PerS: 0.6 }, 0.3)).toBeCloseTo(0.5333, 4);
  });

  it('draws on the same sink-panel face as a flanged opening, nothing from behind', () => {
    expect(hoodFace({ kind: 'downdraft-bench', faceArea_m2: 0.6 })).toEqual(hoodFace({ kind: 'flanged', faceArea_m2: 0.6 }));
    expect(hoodFace({ kind: 'downdraft-bench', faceArea_m2: 0.6 }).frontShare).toBe(1);
  });
});
