import { describe, expect, it } from 'vitest';
import { scenarioInput } from '../../../../tests/fixtures/workspace';
import { runEngine } from '../../../../tests/helpers/run-engine';
import { parseRunResult } from '../../../../shared/schemas/run-result-stored';
import { crossChecksTable, fateTable } from './section-csv';

const view = parseRunResult(runEngine(scenarioInput()).result);

describe('the fate and cross-check tables as CSV', () => {
  it('gives each fate its share and mass, adding up to the simulated share of what was emitted', () => {
    const { header, rows } = fateTable(view);
    expect(header).toEqual(['Fate', 'Share (%)', 'Mass (mg)']);
    expect(rows).toHaveLength(5);
    const mass = rows.reduce((a, r) => a + Number(r[2]), 0);
    // The fates cover the simulated share; the CSV keeps four significant figures.
    expect(mass / view.fate.emitted_mg).toBeCloseTo(1 - (view.massLeftOut?.share ?? 0), 3);
  });

  it('puts the Monte-Carlo figure first and each model with its ratio', () => {
    const { rows } = crossChecksTable(view);
    expect(rows.map((r) => r[0])).toEqual([
      'Monte-Carlo, breathing zone',
      'Well-mixed room',
      'Near field',
      'Far field',
      'Eddy diffusion, steady state',
    ]);
    const mc = Number(rows[0][2]);
    expect(Number(rows[1][3])).toBeCloseTo(mc / view.crossChecks.wellMixed_mgPerM3, 10);
  });
});
