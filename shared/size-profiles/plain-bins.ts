import { type Checked, type CsvRecord, type RowIssue, failed, passed } from './issues';
import { FORMATS } from './formats';
import { type MassBins, checkAmount, normalise } from './mass-bins';
import { readTable } from './read-table';
import { type SizeRange, checkRanges, rangesToBins, toRanges } from './size-ranges';

// Rounded shares rarely add to exactly 1; a larger miss is more likely percentages or a lost row.
export const SUM_TOLERANCE = 0.05;

const [LOWER, UPPER, FRACTION] = FORMATS.bins.columns;

export function parsePlainBins(records: CsvRecord[]): Checked<SizeRange[]> {
  const table = readTable(records, FORMATS.bins.columns);
  if (!table.ok) return failed(table.issues);
  const { rows, cellIssues } = table.value;
  const issues: RowIssue[] = [...cellIssues];
  checkRanges(rows, LOWER, UPPER, issues);
  rows.forEach(({ row, values }) => {
    const share = values[FRACTION];
    if (checkAmount(share, row, FRACTION, issues) && share! > 1)
      issues.push({ row, column: FRACTION, message: `A share of the mass cannot exceed 1, got ${share}` });
  });
  if (issues.length) return failed(issues);
  const sum = rows.reduce((a, r) => a + r.values[FRACTION]!, 0);
  if (Math.abs(sum - 1) > SUM_TOLERANCE) {
    return failed([
      {
        row: null,
        column: FRACTION,
        message: `The mass fractions add up to ${Number(sum.toPrecision(4))}; they must add up to 1 (within ${SUM_TOLERANCE})`,
      },
    ]);
  }
  return passed(toRanges(rows, LOWER, UPPER, FRACTION));
}

export function plainBinsToBins(ranges: SizeRange[]): MassBins {
  const { edges_m, amounts } = rangesToBins(ranges);
  return { edges_m, massFraction: normalise(amounts) };
}
