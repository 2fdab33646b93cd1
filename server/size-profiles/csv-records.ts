import path from 'node:path';
import { parse } from 'csv-parse/sync';
import type { CsvRecord } from '../../shared/size-profiles/index';
import { AppError, type Issue } from '../lib/app-error';

export const MAX_CSV_COLUMNS = 50;

function refuse(message: string, row: number | null = null): AppError {
  const issue = { path: 'file', row, column: null, message };
  return new AppError(422, 'invalid_file', message, [issue]);
}

// A NUL byte or bytes that are not UTF-8 mean a spreadsheet workbook, image or archive, not CSV text.
function decodeText(buffer: Buffer): string {
  if (buffer.includes(0)) throw refuse('The file is not text; save the sheet as CSV (comma-separated values) and upload that');
  try {
    return new TextDecoder('utf-8', { fatal: true }).decode(buffer);
  } catch {
    throw refuse('The file is not UTF-8 text; save the sheet as CSV (UTF-8) and upload that');
  }
}

export function readCsvRecords(file: { originalname: string; buffer: Buffer }): CsvRecord[] {
  if (path.extname(file.originalname).toLowerCase() !== '.csv') throw refuse(`Only .csv files are accepted, got "${file.originalname}"`);
  if (file.buffer.length === 0) throw refuse('The file is empty');
  const text = decodeText(file.buffer);
  try {
    const parsed = parse(text, { bom: true, info: true, skip_empty_lines: true, relax_column_count: true, trim: true }) as unknown as {
      record: string[];
      info: { lines: number };
    }[];
    const wide = parsed.find(({ record }) => record.length > MAX_CSV_COLUMNS);
    // Refused before any per-column message is built, so a hostile header cannot inflate the answer.
    if (wide) {
      const message = `Line ${wide.info.lines} has ${wide.record.length} columns; a size-profile file has at most ${MAX_CSV_COLUMNS}`;
      throw new AppError(400, 'too_many_columns', message, [{ path: 'file', row: wide.info.lines, column: null, message } as Issue]);
    }
    return parsed.map(({ record, info }) => ({ line: info.lines, cells: record }));
  } catch (err) {
    if (err instanceof AppError) throw err;
    const line = (err as { lines?: number }).lines ?? null;
    throw refuse(`The file could not be read as CSV: ${(err as Error).message}`, line);
  }
}
