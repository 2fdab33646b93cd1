import { describe, expect, it } from 'vitest';
import { column } from './column.test-helper';
import { comparisonCsv } from './comparison-csv';
import { targetFor } from './target';

const parse = (csv: string) =>
  csv
    .trim()
    .split('\r\n')
    .map((line) => line.split(/,(?=(?:[^"]*"[^"]*")*[^"]*$)/));

describe('the side-by-side CSV', () => {
  const columns = [
    column(1, { name: 'No control', twa: 0.15, ci: [0.14, 0.16] }),
    column(2, { name: 'Slot hood', airflow_m3PerS: 0.45, twa: 0.001, ci: [0.001, 0.0012] }),
    column(3, { name: 'Not yet', run: false }),
  ];
  const [header, ...rows] = parse(comparisonCsv(columns, targetFor('half')));
  const cell = (row: string[], name: string) => row[header.indexOf(name)];

  it('has one row per scenario and units in the header', () => {
    expect(rows).toHaveLength(3);
    expect(header[0]).toBe('Scenario');
    expect(header).toContain('Total hood airflow (m³/h)');
    expect(header).toContain('Respirable 8-h TWA upper 95 % (mg/m³)');
    for (const row of rows) expect(row).toHaveLength(header.length);
  });

  it('writes raw numbers: airflow in m³/h and the rough fan power in W', () => {
    expect(cell(rows[1], 'Total hood airflow (m³/h)')).toBe('1620');
    expect(Number(cell(rows[1], 'Rough fan power (W)'))).toBeCloseTo(750, 6);
  });

  it('states the difference against the first column and whether it is beyond the error', () => {
    expect(cell(rows[0], 'Beyond statistical error')).toBe('');
    expect(cell(rows[1], 'Beyond statistical error')).toBe('yes');
    expect(Number(cell(rows[1], 'Respirable 8-h TWA difference from first (mg/m³)'))).toBeCloseTo(-0.149, 10);
  });

  it('marks the scenario without a run and the least-airflow option that meets the target', () => {
    expect(cell(rows[2], 'Banner')).toBe('Not run');
    expect(cell(rows[1], 'Least airflow meeting target')).toBe('yes');
    expect(cell(rows[0], 'Least airflow meeting target')).toBe('no');
  });
});
