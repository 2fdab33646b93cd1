// Row numbers count lines as in the file (header = 1); null where a problem belongs to no one row.
export type RowIssue = { row: number | null; column: string | null; message: string };

export type Checked<T> = { ok: true; value: T } | { ok: false; issues: RowIssue[] };

export const failed = <T>(issues: RowIssue[]): Checked<T> => ({ ok: false, issues });
export const passed = <T>(value: T): Checked<T> => ({ ok: true, value });

// A CSV record with the file line it came from; the server's CSV parser supplies both.
export type CsvRecord = { line: number; cells: string[] };

// For callers that hold plain rows without blank lines: row i is on line i + 1.
export const recordsFromRows = (rows: string[][]): CsvRecord[] => rows.map((cells, i) => ({ line: i + 1, cells }));

// Whole-file problems first, then in file order, so the list reads like the file.
export const byRow = (issues: RowIssue[]): RowIssue[] => [...issues].sort((a, b) => (a.row ?? 0) - (b.row ?? 0));
