import type { RowIssue } from './issues';
import { checkSize, micrometres } from './mass-bins';
import type { TableRow } from './read-table';

export type SizeRange = { lower_m: number; upper_m: number; amount: number };

// Edges read from text rarely agree to the last bit; closer than this they are the same edge.
const SAME_EDGE = 1e-9;

export function checkRanges(rows: TableRow[], lower: string, upper: string, issues: RowIssue[]): void {
  let previousUpper: number | null = null;
  for (const { row, values } of rows) {
    const lo = values[lower];
    const hi = values[upper];
    const loOk = checkSize(lo, row, lower, issues);
    const hiOk = checkSize(hi, row, upper, issues);
    if (loOk && hiOk && !(hi! > lo!)) issues.push({ row, column: upper, message: `Must be larger than ${lower} (${lo}), got ${hi}` });
    if (loOk && previousUpper !== null && lo! < previousUpper * (1 - SAME_EDGE)) {
      issues.push({
        row,
        column: lower,
        message: `Overlaps the row above, or rows are not in increasing size: starts at ${lo}, the row above ends at ${previousUpper}`,
      });
    }
    if (hiOk) previousUpper = hi;
  }
}

export function toRanges(rows: TableRow[], lower: string, upper: string, amount: string): SizeRange[] {
  return rows.map(({ values }) => ({
    lower_m: micrometres(values[lower]!),
    upper_m: micrometres(values[upper]!),
    amount: values[amount]!,
  }));
}

// Gaps between rows become empty bins so the edges stay contiguous.
export function rangesToBins(ranges: SizeRange[]): { edges_m: number[]; amounts: number[] } {
  const edges_m = [ranges[0].lower_m];
  const amounts: number[] = [];
  for (const r of ranges) {
    const last = edges_m[edges_m.length - 1];
    if (r.lower_m > last * (1 + SAME_EDGE)) {
      edges_m.push(r.lower_m);
      amounts.push(0);
    }
    edges_m.push(r.upper_m);
    amounts.push(r.amount);
  }
  return { edges_m, amounts };
}
