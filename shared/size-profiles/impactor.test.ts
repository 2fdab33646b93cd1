import { describe, expect, it } from 'vitest';
import { impactorToBins, parseImpactor } from './impactor';
import { recordsFromRows } from './issues';

const csv = (text: string) =>
  recordsFromRows(
    text
      .trim()
      .split('\n')
      .map((l) => l.split(',')),
  );

describe('impactor stages to mass bins', () => {
  it('puts each stage between its cut-point and the one above, top at 2× and backup down to 0.1× (stated assumption)', () => {
    const stages = parseImpactor(csv('cut_point_um,mass_mg\n10,1\n5,2\n2,3\n,4'));
    expect(stages.ok).toBe(true);
    if (!stages.ok) return;
    const bins = impactorToBins(stages.value);
    expect(bins.edges_m.map((d) => Number((d * 1e6).toPrecision(6)))).toEqual([0.2, 2, 5, 10, 20]);
    expect(bins.massFraction).toEqual([0.4, 0.3, 0.2, 0.1]);
  });

  it('takes 0 as the backup filter cut-point, columns in any order and any case', () => {
    const stages = parseImpactor(csv('MASS_MG,Cut_Point_um\n1,8\n1,0'));
    expect(stages.ok && stages.value).toEqual([
      { cutPoint_m: 8e-6, mass_mg: 1 },
      { cutPoint_m: null, mass_mg: 1 },
    ]);
  });

  it('refuses a last row with a cut-point and a backup filter above the last row, naming row and column', () => {
    const result = parseImpactor(csv('cut_point_um,mass_mg\n10,1\n,2\n2,3'));
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.issues).toEqual([
      { row: 3, column: 'cut_point_um', message: expect.stringMatching(/Only the last row/) },
      { row: 4, column: 'cut_point_um', message: expect.stringMatching(/last row must be the backup filter/) },
    ]);
  });

  it('refuses cut-points that do not decrease, and negative masses', () => {
    const result = parseImpactor(csv('cut_point_um,mass_mg\n5,1\n10,-2\n,1'));
    expect(!result.ok && result.issues).toEqual([
      { row: 3, column: 'cut_point_um', message: 'Cut-points must decrease from the top stage down: 10 follows 5' },
      { row: 3, column: 'mass_mg', message: 'Must not be negative, got -2' },
    ]);
  });

  it('refuses stages that hold no mass at all', () => {
    const result = parseImpactor(csv('cut_point_um,mass_mg\n5,0\n,0'));
    expect(!result.ok && result.issues).toEqual([
      { row: null, column: 'mass_mg', message: 'Every mass_mg is zero; at least one must be positive' },
    ]);
  });
});
