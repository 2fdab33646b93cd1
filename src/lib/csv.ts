import { fileDate, trimSig } from '../../shared/format/index';
import { downloadText } from './download';

export type Cell = string | number | null | undefined;

/** Significant figures a non-integer keeps in a file: beyond a run's own statistical error, short of float noise. */
export const CSV_DIGITS = 4;

const numberText = (value: number, digits: number) =>
  !Number.isFinite(value) ? '' : Number.isInteger(value) ? String(value) : trimSig(value, digits);

// RFC 4180 quoting; a leading =, +, - or @ is prefixed so spreadsheets do not run it as a formula.
export function csvCell(value: Cell, digits = CSV_DIGITS): string {
  if (value === null || value === undefined) return '';
  let text = typeof value === 'number' ? numberText(value, digits) : value;
  if (/^[=+\-@]/.test(text) && typeof value === 'string') text = `'${text}`;
  return /[",\n\r]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

/** Counts, ids and seeds stay whole; other numbers keep `digits` significant figures. */
export function toCsv(header: string[], rows: Cell[][], digits = CSV_DIGITS): string {
  return [header, ...rows].map((r) => r.map((c) => csvCell(c, digits)).join(',')).join('\r\n') + '\r\n';
}

// Accents folded and everything else turned into dashes, so the name survives every file system.
const slug = (text: string) =>
  text
    .normalize('NFKD')
    .replace(/[\u0300-\u036f]/g, '')
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '');

/** "motewalk-flanged-hood-fractions-2026-12-02.csv": what is in it, and the day it was taken. */
export function csvFileName(parts: (string | null | undefined)[], when = new Date()): string {
  const name = slug(parts.filter(Boolean).join(' ')).slice(0, 80).replace(/-+$/, '');
  return `motewalk-${name ? `${name}-` : ''}${fileDate(when)}.csv`;
}

export function downloadCsv(filename: string, text: string) {
  downloadText(filename, text);
}

/** The one way a screen hands a table to the reader's spreadsheet. */
export function downloadTable(parts: (string | null | undefined)[], header: string[], rows: Cell[][]) {
  downloadText(csvFileName(parts), toCsv(header, rows));
}
