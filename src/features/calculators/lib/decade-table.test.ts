import { describe, expect, it } from 'vitest';
import { decadeTableCsv, decadeTableTsv } from './decade-table';
import { mediumFor } from './particle-properties';

const unitDensity = mediumFor({ density_kgPerM3: 1000, shapeFactor: 1, temperature_K: 293.15, pressure_Pa: 101325, window_s: 1 });

function parse(csv: string) {
  const [head, ...body] = csv.trimEnd().split('\r\n');
  const headers = head.split(',').map((h) => h.replace(/^"|"$/g, ''));
  const rows = body.map((line) => Object.fromEntries(line.split(',').map((v, i) => [headers[i], Number(v)])));
  const byDiameter = (d_um: number) => rows.find((r) => Math.abs(r['Diameter (µm)'] / d_um - 1) < 1e-9)!;
  return { headers, rows, byDiameter };
}

const within = (actual: number, expected: number, relative: number) =>
  expect(Math.abs(actual / expected - 1)).toBeLessThanOrEqual(relative);

describe('the decade table as CSV', () => {
  const table = parse(decadeTableCsv(unitDensity));

  it('has one row per decade from 1 nm to 100 µm, and every header names its unit', () => {
    expect(table.rows.map((r) => r['Diameter (µm)'])).toEqual([0.001, 0.01, 0.1, 1, 10, 100]);
    for (const h of table.headers) expect(h).toMatch(/\((µm|–|m\/s|s|m²\/s|m|%)\)$/);
    expect(table.headers).toContain('Settling distance over 1 s (m)');
  });

  // [S] Hinds, Aerosol Technology 2nd ed., App. A11, tolerance 0.5 % (physics.md §2).
  it.each([
    [0.001, 224.332],
    [0.01, 22.976],
    [0.1, 2.928],
    [1, 1.155],
    [10, 1.015],
    [100, 1.002],
  ])('gives the slip factor at %s µm as %s ([S] Hinds App. A11)', (d_um, cc) => {
    within(table.byDiameter(d_um)['Slip factor (–)'], cc, 0.005);
  });

  // [M] Hinds App. A11, from memory: 3.06e-3 m/s at 10 µm; 0.25 m/s at 100 µm with drag correction, to 3 %.
  it('gives settling velocities at 10 and 100 µm as in Hinds App. A11 (from memory)', () => {
    within(table.byDiameter(10)['Settling velocity (m/s)'], 3.06e-3, 0.03);
    within(table.byDiameter(100)['Settling velocity (m/s)'], 0.25, 0.03);
  });

  // [M] Hinds Table 7.1, from memory, within 3 % (physics.md §4).
  it.each([
    [0.01, 5.4e-8],
    [0.1, 6.9e-10],
    [1, 2.7e-11],
    [10, 2.4e-12],
  ])('gives the Brownian diffusivity at %s µm as %s m²/s ([M] Hinds Table 7.1, from memory)', (d_um, D) => {
    within(table.byDiameter(d_um)['Brownian diffusivity (m²/s)'], D, 0.03);
  });

  // [C] Hinds Eq. 7.18 x = √(2Dt), and distance = V·t, recomputed here from the table's own D and V.
  it('gives distances over the window that follow from its own diffusivity and velocity ([C] Hinds Eq. 7.18)', () => {
    for (const r of table.rows) {
      within(r['RMS Brownian displacement over 1 s (m)'], Math.sqrt(2 * r['Brownian diffusivity (m²/s)'] * 1), 1e-5);
      within(r['Settling distance over 1 s (m)'], r['Settling velocity (m/s)'] * 1, 1e-5);
    }
  });

  // [S] ISO 7708 / Soderholm 1989: at 1 µm aerodynamic, E_R = E_T = 97.1 %, ±0.5 points (physics.md §6).
  it('gives the health-related fractions at 1 µm unit density as tabulated in ISO 7708 ([S] Soderholm 1989)', () => {
    const r = table.byDiameter(1);
    within(r['Aerodynamic diameter (µm)'], 1, 1e-6);
    expect(Math.abs(r['Respirable (%)'] - 97.1)).toBeLessThanOrEqual(0.5);
    expect(Math.abs(r['Thoracic (%)'] - 97.1)).toBeLessThanOrEqual(0.5);
    expect(table.byDiameter(100)['Respirable (%)']).toBeLessThan(1e-6);
  });
});

describe('the decade table as tab-separated text', () => {
  it('holds the same numbers as the CSV', () => {
    const tsv = decadeTableTsv(unitDensity).replaceAll('\t', ',');
    const csv = decadeTableCsv(unitDensity).replace(/"([^"]*)"/g, '$1');
    expect(tsv).toBe(csv);
  });
});
