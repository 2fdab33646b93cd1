import type { RowIssue } from './issues';
import { MAX_AMOUNT, MAX_SIZE_um, MIN_SIZE_um } from './formats';

// Aerodynamic-diameter edges in increasing order; massFraction[i] lies between edges_m[i] and edges_m[i + 1].
export type MassBins = { edges_m: number[]; massFraction: number[] };

// Cells that failed to read are null and were reported already.
export function checkSize(value: number | null, row: number, column: string, issues: RowIssue[]): boolean {
  if (value === null) return false;
  if (value <= 0) issues.push({ row, column, message: `Must be a positive size in µm, got ${value}` });
  else if (value < MIN_SIZE_um || value > MAX_SIZE_um)
    issues.push({ row, column, message: `Must lie between ${MIN_SIZE_um} and ${MAX_SIZE_um} µm, got ${value}` });
  else return true;
  return false;
}

export function checkAmount(value: number | null, row: number, column: string, issues: RowIssue[]): boolean {
  if (value === null) return false;
  if (value < 0) issues.push({ row, column, message: `Must not be negative, got ${value}` });
  else if (value > MAX_AMOUNT) issues.push({ row, column, message: `Implausibly large, got ${value}` });
  else return true;
  return false;
}

export const micrometres = (value_um: number): number => value_um / 1e6;

// Shares only matter relative to each other; the caller has checked that the total is positive.
export function normalise(amounts: number[]): number[] {
  const total = amounts.reduce((a, v) => a + v, 0);
  return amounts.map((v) => v / total);
}

export function totalIssue(amounts: number[], column: string): RowIssue[] {
  return amounts.some((v) => v > 0) ? [] : [{ row: null, column, message: `Every ${column} is zero; at least one must be positive` }];
}
