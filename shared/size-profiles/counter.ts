import { aerodynamicDiameter } from '../physics/index';
import { type Checked, type CsvRecord, type RowIssue, failed, passed } from './issues';
import { FORMATS } from './formats';
import { type MassBins, checkAmount, normalise, totalIssue } from './mass-bins';
import { readTable } from './read-table';
import { type SizeRange, checkRanges, rangesToBins, toRanges } from './size-ranges';

export const MIN_DENSITY_kgPerM3 = 100;
export const MAX_DENSITY_kgPerM3 = 25_000;

const [LOWER, UPPER, COUNT] = FORMATS.counter.columns;

export function parseCounter(records: CsvRecord[]): Checked<SizeRange[]> {
  const table = readTable(records, FORMATS.counter.columns);
  if (!table.ok) return failed(table.issues);
  const { rows, cellIssues } = table.value;
  const issues: RowIssue[] = [...cellIssues];
  checkRanges(rows, LOWER, UPPER, issues);
  rows.forEach(({ row, values }) => checkAmount(values[COUNT], row, COUNT, issues));
  if (issues.length) return failed(issues);
  const zero = totalIssue(
    rows.map((r) => r.values[COUNT]!),
    COUNT,
  );
  return zero.length ? failed(zero) : passed(toRanges(rows, LOWER, UPPER, COUNT));
}

export function densityIssue(density_kgPerM3: number | undefined): RowIssue[] {
  if (density_kgPerM3 === undefined)
    return [{ row: null, column: 'density_kgPerM3', message: 'Counter data needs the particle density to turn counts into mass' }];
  if (!(density_kgPerM3 >= MIN_DENSITY_kgPerM3 && density_kgPerM3 <= MAX_DENSITY_kgPerM3)) {
    return [
      {
        row: null,
        column: 'density_kgPerM3',
        message: `Density must lie between ${MIN_DENSITY_kgPerM3} and ${MAX_DENSITY_kgPerM3} kg/m³, got ${density_kgPerM3}`,
      },
    ];
  }
  return [];
}

// Sphere mass count·ρ·π/6·d³ at the bin's geometric mid-diameter; edges become aerodynamic (Hinds Eq. 3.26 form, χ = 1).
export function counterToBins(ranges: SizeRange[], density_kgPerM3: number): MassBins {
  const { edges_m, amounts } = rangesToBins(ranges);
  const mass = amounts.map((count, i) => count * density_kgPerM3 * (Math.PI / 6) * (edges_m[i] * edges_m[i + 1]) ** 1.5);
  return { edges_m: edges_m.map((d) => aerodynamicDiameter(d, density_kgPerM3)), massFraction: normalise(mass) };
}
