import { describe, expect, it } from 'vitest';
import { parse } from 'csv-parse/sync';
import { toCsv } from './csv';

describe('toCsv', () => {
  it('writes text a general-purpose CSV parser (csv-parse) reads back cell for cell', () => {
    const rows = [
      ['Hood, flanged', 0.025, 'said "ok"'],
      ['line\nbreak', null, 3],
    ];
    const text = toCsv(['name', 'twa_mg_per_m3', 'note'], rows);
    expect(parse(text)).toEqual([
      ['name', 'twa_mg_per_m3', 'note'],
      ['Hood, flanged', '0.025', 'said "ok"'],
      ['line\nbreak', '', '3'],
    ]);
  });

  it('defuses cells that a spreadsheet would run as formulas', () => {
    expect(toCsv(['a'], [['=HYPERLINK("x")']])).toBe(`a\r\n"'=HYPERLINK(""x"")"\r\n`);
  });
});
