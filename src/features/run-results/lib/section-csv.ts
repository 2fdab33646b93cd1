import { FATE_LABEL, FATES, FRACTION_LABEL } from '../../../../shared/vocabulary/index';
import type { RunResult } from '../../../../shared/schemas/run-result';
import type { Cell } from '@/lib/csv';

export type CsvTable = { header: string[]; rows: Cell[][] };

export function fateTable(view: RunResult): CsvTable {
  const { emitted_mg, ...shares } = view.fate;
  return {
    header: ['Fate', 'Share (%)', 'Mass (mg)'],
    rows: FATES.map((f) => [FATE_LABEL[f], 100 * shares[f], shares[f] * emitted_mg]),
  };
}

const CROSS_CHECKS = [
  ['Well-mixed room', 'wellMixed_mgPerM3'],
  ['Near field', 'nearField_mgPerM3'],
  ['Far field', 'farField_mgPerM3'],
  ['Eddy diffusion, steady state', 'eddySteady_mgPerM3'],
] as const;

export function crossChecksTable(view: RunResult): CsvTable {
  const c = view.crossChecks;
  const mc = view.breathingZone.fractions[c.fraction].taskMean_mgPerM3;
  const fraction = FRACTION_LABEL[c.fraction];
  return {
    header: ['Model', 'Fraction', 'Concentration (mg/m³)', 'Monte-Carlo ÷ model'],
    rows: [
      ['Monte-Carlo, breathing zone', fraction, mc, null],
      ...CROSS_CHECKS.map(([model, key]): Cell[] => [model, fraction, c[key], c[key] > 0 ? mc / c[key] : null]),
    ],
  };
}
