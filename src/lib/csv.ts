import { downloadText } from './download';

type Cell = string | number | null | undefined;

// RFC 4180 quoting; a leading =, +, - or @ is prefixed so spreadsheets do not run it as a formula.
export function csvCell(value: Cell): string {
  if (value === null || value === undefined) return '';
  let text = typeof value === 'number' ? (Number.isFinite(value) ? String(value) : '') : value;
  if (/^[=+\-@]/.test(text) && typeof value === 'string') text = `'${text}`;
  return /[",\n\r]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

export function toCsv(header: string[], rows: Cell[][]): string {
  return [header, ...rows].map((r) => r.map(csvCell).join(',')).join('\r\n') + '\r\n';
}

export function downloadCsv(filename: string, text: string) {
  downloadText(filename, text);
}
