import { type Checked, type CsvRecord, type RowIssue, failed, passed } from './issues';
import { FORMATS } from './formats';
import { type MassBins, checkAmount, checkSize, micrometres, normalise, totalIssue } from './mass-bins';
import { readTable } from './read-table';

export type ImpactorStage = { cutPoint_m: number | null; mass_mg: number };

// Assumptions stated on the page: the top stage collects up to 2× its cut-point, the backup filter
// down to 0.1× the last cut-point. Neither edge is measured; both only bound the outermost bins.
export const TOP_STAGE_UPPER_FACTOR = 2;
export const BACKUP_LOWER_FACTOR = 0.1;

const [CUT, MASS] = FORMATS.impactor.columns;

export function parseImpactor(records: CsvRecord[]): Checked<ImpactorStage[]> {
  const table = readTable(records, FORMATS.impactor.columns, [CUT]);
  if (!table.ok) return failed(table.issues);
  const { rows, cellIssues } = table.value;
  const issues: RowIssue[] = [...cellIssues];
  const last = rows.length - 1;
  const bad = (row: number) => cellIssues.some((i) => i.row === row && i.column === CUT);
  let above: number | null = null;
  rows.forEach(({ row, values }, i) => {
    const cut = values[CUT];
    const isBackup = (cut === null && !bad(row)) || cut === 0;
    if (i === last && !isBackup && !bad(row))
      issues.push({ row, column: CUT, message: 'The last row must be the backup filter: leave cut_point_um empty or write 0' });
    if (i < last && isBackup)
      issues.push({ row, column: CUT, message: 'Only the last row may be the backup filter; every stage above it needs a cut-point' });
    if (i < last && !isBackup && checkSize(cut, row, CUT, issues)) {
      if (above !== null && !(cut! < above))
        issues.push({ row, column: CUT, message: `Cut-points must decrease from the top stage down: ${cut} follows ${above}` });
      above = cut;
    }
    checkAmount(values[MASS], row, MASS, issues);
  });
  if (issues.length) return failed(issues);
  const zero = totalIssue(
    rows.map((r) => r.values[MASS]!),
    MASS,
  );
  if (zero.length) return failed(zero);
  return passed(rows.map(({ values }, i) => ({ cutPoint_m: i === last ? null : micrometres(values[CUT]!), mass_mg: values[MASS]! })));
}

// Stage i collects between its cut-point and the cut-point of the stage above it.
export function impactorToBins(stages: ImpactorStage[]): MassBins {
  const cuts_m = stages.slice(0, -1).map((s) => s.cutPoint_m!);
  const edges_m = [BACKUP_LOWER_FACTOR * cuts_m[cuts_m.length - 1], ...[...cuts_m].reverse(), TOP_STAGE_UPPER_FACTOR * cuts_m[0]];
  return { edges_m, massFraction: normalise(stages.map((s) => s.mass_mg).reverse()) };
}
