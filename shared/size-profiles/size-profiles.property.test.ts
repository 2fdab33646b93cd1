import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { binFractions } from './bin-fractions';
import { buildFromUpload } from './build-profile';
import { UPLOAD_FORMATS } from './formats';
import { recordsFromRows } from './issues';

const tolerance = 1e-12;

// Increasing edges within 0.01–810 µm from random log-steps, with non-negative shares, at least one positive.
const binTable = fc
  .record({
    start_um: fc.double({ min: 0.01, max: 2, noNaN: true }),
    steps: fc.array(fc.double({ min: 0.05, max: 0.2, noNaN: true }), { minLength: 2, maxLength: 30 }),
    weights: fc.array(fc.double({ min: 0, max: 1, noNaN: true }), { minLength: 30, maxLength: 30 }),
  })
  .filter((t) => t.weights.slice(0, t.steps.length).some((w) => w > 1e-6));

function toCsv(t: { start_um: number; steps: number[]; weights: number[] }) {
  const edges = [t.start_um];
  for (const s of t.steps) edges.push(edges[edges.length - 1] * Math.exp(s));
  const w = t.weights.slice(0, t.steps.length);
  const total = w.reduce((a, v) => a + v, 0);
  const shares = w.map((v) => v / total);
  const rows = [['lower_um', 'upper_um', 'mass_fraction'], ...shares.map((m, i) => [String(edges[i]), String(edges[i + 1]), String(m)])];
  return { rows, edges, shares };
}

describe('size-profile properties', () => {
  it('fractions lie in [0, 1] and respirable ≤ thoracic ≤ inhalable for any valid bin table (ISO 7708 curves nest)', () => {
    fc.assert(
      fc.property(binTable, (t) => {
        const { edges, shares } = toCsv(t);
        const f = binFractions({ edges_m: edges.map((d) => d * 1e-6), massFraction: shares });
        for (const v of [f.respirable, f.thoracic, f.inhalable]) {
          expect(v).toBeGreaterThanOrEqual(0);
          expect(v).toBeLessThanOrEqual(1);
        }
        expect(f.respirable).toBeLessThanOrEqual(f.thoracic + tolerance);
        expect(f.thoracic).toBeLessThanOrEqual(f.inhalable + tolerance);
      }),
    );
  });

  it('any valid generated bin table round-trips through the CSV rows to the same edges and shares', () => {
    fc.assert(
      fc.property(binTable, (t) => {
        const { rows, edges, shares } = toCsv(t);
        const result = buildFromUpload('bins', recordsFromRows(rows), { fileName: 't.csv' });
        expect(result.ok).toBe(true);
        if (!result.ok) return;
        result.value.bins.edges_m.forEach((d, i) => expect(d / (edges[i] * 1e-6)).toBeCloseTo(1, 12));
        result.value.bins.massFraction.forEach((m, i) => expect(m).toBeCloseTo(shares[i], 12));
        expect(result.value.bins.massFraction.reduce((a, m) => a + m, 0)).toBeCloseTo(1, 12);
      }),
    );
  });

  it('random garbage never throws: it gives a profile or a list of row issues', () => {
    const cell = fc.oneof(
      fc.string({ maxLength: 8 }),
      fc.double().map(String),
      fc.constantFrom('', '0', '-1', 'NaN', '1e400', 'cut_point_um', 'mass_mg', 'lower_um', 'upper_um', 'count'),
    );
    const rows = fc.array(fc.array(cell, { maxLength: 5 }), { maxLength: 12 });
    fc.assert(
      fc.property(fc.constantFrom(...UPLOAD_FORMATS), rows, fc.option(fc.double(), { nil: undefined }), (format, table, density) => {
        const result = buildFromUpload(format, recordsFromRows(table), { fileName: 'g.csv', density_kgPerM3: density });
        if (result.ok) {
          expect(result.value.bins.massFraction.every((m) => Number.isFinite(m) && m >= 0)).toBe(true);
        } else {
          expect(result.issues.length).toBeGreaterThan(0);
          for (const issue of result.issues) expect(typeof issue.message).toBe('string');
        }
      }),
      { numRuns: 500 },
    );
  });

  it('garbage shaped like a valid header still never throws', () => {
    const number = fc.oneof(fc.double({ min: -10, max: 2000 }).map(String), fc.constantFrom('', '0', 'x'));
    const body = fc.array(fc.tuple(number, number, number), { minLength: 0, maxLength: 20 });
    fc.assert(
      fc.property(body, fc.double({ min: 50, max: 30000, noNaN: true }), (data, density) => {
        for (const [format, header] of [
          ['impactor', ['cut_point_um', 'mass_mg']],
          ['counter', ['lower_um', 'upper_um', 'count']],
          ['bins', ['lower_um', 'upper_um', 'mass_fraction']],
        ] as const) {
          const rows = [[...header], ...data.map((r) => r.slice(0, header.length))];
          const result = buildFromUpload(format, recordsFromRows(rows), { fileName: 'g.csv', density_kgPerM3: density });
          expect(typeof result.ok).toBe('boolean');
          if (result.ok) expect(Math.abs(result.value.bins.massFraction.reduce((a, m) => a + m, 0) - 1)).toBeLessThan(1e-9);
        }
      }),
      { numRuns: 300 },
    );
  });
});
