import { type Checked, type CsvRecord, type RowIssue, failed, passed } from './issues';
import { MAX_DATA_ROWS, MIN_DATA_ROWS } from './formats';

export type TableRow = { row: number; values: Record<string, number | null> };
// Rows come back even when some cells fail, so the format's own checks still see every good cell.
export type Table = { rows: TableRow[]; cellIssues: RowIssue[] };

// Plain decimal or exponent notation only: Number() would also take '0x1f', 'Infinity' and ' '.
const NUMBER = /^[+-]?(\d+(\.\d*)?|\.\d+)([eE][+-]?\d+)?$/;

const normalise = (name: string) => name.trim().toLowerCase();
const isBlank = (cells: string[]) => cells.every((c) => String(c ?? '').trim() === '');

function readHeader(header: CsvRecord, columns: readonly string[]): Checked<number[]> {
  const names = header.cells.map((c) => normalise(String(c ?? '')));
  const issues: RowIssue[] = [];
  const expected = columns.join(',');
  names.forEach((name, i) => {
    if (!columns.includes(name))
      issues.push({
        row: header.line,
        column: name || `column ${i + 1}`,
        message: `Unexpected column "${name}"; this format has the columns ${expected}`,
      });
    else if (names.indexOf(name) !== i) issues.push({ row: header.line, column: name, message: `Column ${name} appears twice` });
  });
  for (const column of columns) {
    if (!names.includes(column))
      issues.push({ row: header.line, column, message: `Missing column ${column}; the header must read ${expected}` });
  }
  return issues.length ? failed(issues) : passed(columns.map((c) => names.indexOf(c)));
}

function readCell(raw: string, row: number, column: string, allowEmpty: boolean, issues: RowIssue[]): number | null {
  const text = String(raw ?? '').trim();
  if (text === '') {
    if (!allowEmpty) issues.push({ row, column, message: 'Empty; a number is needed' });
    return null;
  }
  const value = NUMBER.test(text) ? Number(text) : NaN;
  if (!Number.isFinite(value)) issues.push({ row, column, message: `"${text.slice(0, 30)}" is not a number` });
  return Number.isFinite(value) ? value : null;
}

// Fails only when the file's shape is wrong (header, row count); bad cells are collected and left null.
export function readTable(records: CsvRecord[], columns: readonly string[], allowEmpty: readonly string[] = []): Checked<Table> {
  const nonBlank = records.filter((r) => Array.isArray(r.cells) && !isBlank(r.cells));
  if (nonBlank.length === 0)
    return failed([
      {
        row: null,
        column: null,
        message: `The file is empty; it needs a header row (${columns.join(',')}) and at least ${MIN_DATA_ROWS} data rows`,
      },
    ]);
  const [header, ...data] = nonBlank;
  const order = readHeader(header, columns);
  if (!order.ok) return failed(order.issues);
  if (data.length < MIN_DATA_ROWS)
    return failed([{ row: null, column: null, message: `At least ${MIN_DATA_ROWS} data rows are needed, found ${data.length}` }]);
  if (data.length > MAX_DATA_ROWS)
    return failed([
      { row: data[MAX_DATA_ROWS].line, column: null, message: `At most ${MAX_DATA_ROWS} data rows are allowed, found ${data.length}` },
    ]);
  const issues: RowIssue[] = [];
  const rows = data.map((record) => {
    // Spreadsheets often export trailing empty cells; only real extra values are a problem.
    if (!isBlank(record.cells.slice(columns.length))) {
      issues.push({ row: record.line, column: null, message: `Has ${record.cells.length} cells; the header has ${columns.length}` });
    }
    const values: Record<string, number | null> = {};
    columns.forEach((column, i) => {
      values[column] = readCell(record.cells[order.value[i]], record.line, column, allowEmpty.includes(column), issues);
    });
    return { row: record.line, values };
  });
  return passed({ rows, cellIssues: issues });
}
