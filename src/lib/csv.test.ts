import { describe, expect, it } from 'vitest';
import { parse } from 'csv-parse/sync';
import { csvFileName, toCsv } from './csv';

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

  it('keeps four significant figures and drops float noise, but leaves whole numbers whole', () => {
    expect(toCsv(['a', 'b', 'c', 'd'], [[0.30000000000000004, 0.0227483, 3.48e-7, 20240601]])).toBe(
      'a,b,c,d\r\n0.3,0.02275,3.48e-7,20240601\r\n',
    );
    expect(toCsv(['a'], [[Number.NaN]])).toBe('a\r\n\r\n');
  });
});

describe('csvFileName', () => {
  const day = new Date(2026, 11, 2, 9, 30);
  it('names the file after its subject and the day', () => {
    expect(csvFileName(['Flanged hood', 'fractions'], day)).toBe('motewalk-flanged-hood-fractions-2026-12-02.csv');
  });
  it('folds accents, drops symbols and skips missing parts', () => {
    expect(csvFileName(['Säge / Schleifplatz №2', null, 'fate'], day)).toBe('motewalk-sage-schleifplatz-no2-fate-2026-12-02.csv');
    expect(csvFileName([], day)).toBe('motewalk-2026-12-02.csv');
  });
});
