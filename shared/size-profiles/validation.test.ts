import { describe, expect, it } from 'vitest';
import { buildFromUpload } from './build-profile';
import type { UploadFormat } from './formats';
import { type CsvRecord, recordsFromRows } from './issues';

const csv = (text: string): CsvRecord[] => recordsFromRows(text.split('\n').map((l) => l.split(',')));
const issuesOf = (format: UploadFormat, text: string, density_kgPerM3?: number) => {
  const result = buildFromUpload(format, csv(text), { fileName: 'x.csv', density_kgPerM3 });
  return result.ok ? [] : result.issues;
};

// Each check below is a rule of our own file formats (formats.ts), stated on the upload page.
describe('size-profile file validation reports row and column', () => {
  it('reports an empty file', () => {
    expect(issuesOf('bins', '')).toEqual([{ row: null, column: null, message: expect.stringMatching(/file is empty/) }]);
  });

  it('reports a wrong header: unexpected and missing columns on row 1', () => {
    expect(issuesOf('bins', 'lower_um,upper,mass_fraction\n1,2,0.5\n2,3,0.5')).toEqual([
      { row: 1, column: 'upper', message: expect.stringMatching(/Unexpected column "upper"/) },
      { row: 1, column: 'upper_um', message: expect.stringMatching(/Missing column upper_um/) },
    ]);
  });

  it('reports a column given twice', () => {
    expect(issuesOf('impactor', 'mass_mg,mass_mg\n1,2\n3,4')).toContainEqual({
      row: 1,
      column: 'mass_mg',
      message: 'Column mass_mg appears twice',
    });
  });

  it('reports fewer than 2 and more than 200 data rows', () => {
    expect(issuesOf('bins', 'lower_um,upper_um,mass_fraction\n1,2,1')[0].message).toMatch(/At least 2 data rows/);
    const many = ['lower_um,upper_um,mass_fraction', ...Array.from({ length: 201 }, (_, i) => `${i + 1},${i + 2},0.004975`)].join('\n');
    expect(issuesOf('bins', many)).toEqual([{ row: 202, column: null, message: 'At most 200 data rows are allowed, found 201' }]);
  });

  it('reports text, hex, empty and missing cells, and a row with too many cells', () => {
    expect(issuesOf('counter', 'lower_um,upper_um,count\n1,2,abc\n2,0x3,5\n3,,5\n4,5,6,7\n5', 2650)).toEqual([
      { row: 2, column: 'count', message: '"abc" is not a number' },
      { row: 3, column: 'upper_um', message: '"0x3" is not a number' },
      { row: 4, column: 'upper_um', message: 'Empty; a number is needed' },
      { row: 5, column: null, message: 'Has 4 cells; the header has 3' },
      { row: 6, column: 'upper_um', message: 'Empty; a number is needed' },
      { row: 6, column: 'count', message: 'Empty; a number is needed' },
    ]);
  });

  it('reports negative and zero sizes, an upper edge below the lower, and a negative count together', () => {
    expect(issuesOf('counter', 'lower_um,upper_um,count\n-1,2,5\n3,2,-4\n0,5,1', 2650)).toEqual([
      { row: 2, column: 'lower_um', message: 'Must be a positive size in µm, got -1' },
      { row: 3, column: 'upper_um', message: 'Must be larger than lower_um (3), got 2' },
      { row: 3, column: 'count', message: 'Must not be negative, got -4' },
      { row: 4, column: 'lower_um', message: 'Must be a positive size in µm, got 0' },
    ]);
  });

  it('reports overlapping or unordered rows', () => {
    expect(issuesOf('bins', 'lower_um,upper_um,mass_fraction\n1,3,0.5\n2,4,0.5')).toEqual([
      { row: 3, column: 'lower_um', message: expect.stringMatching(/Overlaps the row above/) },
    ]);
  });

  it('reports sizes beyond 0.001–1000 µm', () => {
    expect(issuesOf('bins', 'lower_um,upper_um,mass_fraction\n1,2,0.5\n2,5000,0.5')[0]).toMatchObject({ row: 3, column: 'upper_um' });
  });

  it('reports mass fractions above 1 or not adding up to 1', () => {
    expect(issuesOf('bins', 'lower_um,upper_um,mass_fraction\n1,2,40\n2,3,60')[0]).toMatchObject({ row: 2, column: 'mass_fraction' });
    expect(issuesOf('bins', 'lower_um,upper_um,mass_fraction\n1,2,0.4\n2,3,0.4')).toEqual([
      { row: null, column: 'mass_fraction', message: expect.stringMatching(/add up to 0.8/) },
    ]);
  });

  it('reports a missing or implausible density for counter data', () => {
    const text = 'lower_um,upper_um,count\n1,2,5\n2,3,5';
    expect(issuesOf('counter', text)).toEqual([
      { row: null, column: 'density_kgPerM3', message: expect.stringMatching(/needs the particle density/) },
    ]);
    expect(issuesOf('counter', text, 5)[0].column).toBe('density_kgPerM3');
  });

  it('keeps file line numbers when blank lines were skipped', () => {
    const records = [
      { line: 1, cells: ['lower_um', 'upper_um', 'mass_fraction'] },
      { line: 3, cells: ['1', '2', '0.5'] },
      { line: 7, cells: ['2', '3', '-0.5'] },
    ];
    const result = buildFromUpload('bins', records, { fileName: 'x.csv' });
    expect(!result.ok && result.issues[0]).toMatchObject({ row: 7, column: 'mass_fraction' });
  });
});
