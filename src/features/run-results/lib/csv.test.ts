import { describe, expect, it } from 'vitest';
import { scenarioInput } from '../../../../tests/fixtures/workspace';
import { runEngine } from '../../../../tests/helpers/run-engine';
import { toCsv } from '@/lib/csv';
import { fractionTableCsv, seriesCsv } from './csv';
import { parseRunResult } from '../../../../shared/schemas/run-result-stored';

const view = parseRunResult(runEngine(scenarioInput()).result);
const parse = (csv: string) =>
  csv
    .trimEnd()
    .split('\r\n')
    .map((line) => line.split(','));

// The CSV writer keeps four significant figures (src/lib/csv.ts).
const four = (v: number) => Number(v.toPrecision(4));
describe('CSV builders', () => {
  it('quote cells holding commas or quotes and leave missing figures empty', () => {
    expect(
      toCsv(
        ['a', 'b'],
        [
          ['x, y', NaN],
          ['say "hi"', 2],
        ],
      ),
    ).toBe('a,b\r\n"x, y",\r\n"say ""hi""",2\r\n');
  });

  it('write one row per fraction with units in every numeric header', () => {
    const rows = parse(fractionTableCsv(view));
    expect(rows).toHaveLength(5);
    expect(rows.map((r) => r[0])).toEqual(['Fraction', 'Total', 'Inhalable', 'Thoracic', 'Respirable']);
    for (const h of rows[0].slice(1)) expect(h).toMatch(/\((mg\/m³|% of limit)\)$/);
    const respirable = rows[4];
    expect(Number(respirable[4])).toBe(four(view.breathingZone.fractions.respirable.twa8h_mgPerM3));
    expect(Number(respirable[7])).toBe(four(view.breathingZone.fractions.respirable.peak15min_mgPerM3));
    expect(Number(respirable[9])).toBe(four(view.breathingZone.fractions.respirable.peak15minCi95_mgPerM3![1]));
    expect(Number(respirable[13])).toBe(four(view.limit!.percentOfLimit));
    // The limit applies to one fraction; the others get no % of limit.
    expect(rows[1][13]).toBe('');
  });

  it('write the time series to four significant figures, one row per time bin', () => {
    const rows = parse(seriesCsv(view));
    expect(rows[0][0]).toBe('Time (s)');
    expect(rows[0]).toHaveLength(1 + 4 * 3);
    expect(rows).toHaveLength(view.breathingZone.series.time_s.length + 1);
    expect(Number(rows[1][0])).toBe(four(view.breathingZone.series.time_s[0]));
    const last = rows.length - 1;
    expect(Number(rows[last][10])).toBe(four(view.breathingZone.series.respirable.mean[last - 1]));
  });
});
