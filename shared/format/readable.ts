import { formatSig } from './significant';

const SUPERSCRIPT: Record<string, string> = {
  '-': '⁻',
  '0': '⁰',
  '1': '¹',
  '2': '²',
  '3': '³',
  '4': '⁴',
  '5': '⁵',
  '6': '⁶',
  '7': '⁷',
  '8': '⁸',
  '9': '⁹',
};

export const superscript = (exponent: number): string => String(exponent).replace(/./g, (c) => SUPERSCRIPT[c] ?? c);

// Engineers read 2.70 × 10⁻⁵ faster than 2.70e-5; a missing figure reads as a dash, never "NaN".
export function readableNumber(value: number, digits = 3): string {
  if (!Number.isFinite(value)) return '—';
  const text = formatSig(value, digits);
  const match = /^(-?[\d.]+)e([+-]\d+)$/.exec(text);
  return match ? `${match[1]} × 10${superscript(Number(match[2]))}` : text;
}

// Decade ticks on log axes: 10⁻⁵ rather than a mix of 0.001 and 1 × 10⁻⁵.
export function powerOfTen(value: number): string {
  const exponent = Math.round(Math.log10(value));
  if (exponent === 0) return '1';
  if (exponent === 1) return '10';
  return `10${superscript(exponent)}`;
}
