import { formatSig } from '../../../../shared/units.ts';
import type { Ci } from './normalise-result.ts';

const SUPERSCRIPT: Record<string, string> = { '-': '⁻', '0': '⁰', '1': '¹', '2': '²', '3': '³', '4': '⁴', '5': '⁵', '6': '⁶', '7': '⁷', '8': '⁸', '9': '⁹' };

// Engineers read 2.70 × 10⁻⁵ faster than 2.70e-5; a missing figure reads as a dash, never "NaN".
export function num(value: number, digits = 3): string {
  if (!Number.isFinite(value)) return '—';
  const text = formatSig(value, digits);
  const match = /^(-?[\d.]+)e([+-]\d+)$/.exec(text);
  if (!match) return text;
  return `${match[1]} × 10${String(Number(match[2])).replace(/./g, (c) => SUPERSCRIPT[c] ?? c)}`;
}

export const ciText = ([lo, hi]: Ci, digits = 3): string => `${num(lo, digits)}–${num(hi, digits)}`;

export const percent = (value: number, digits = 2): string => (Number.isFinite(value) ? `${num(value, digits)} %` : '—');

// Relative half-width of the 95 % interval; the lower bound is clipped at zero, so the upper side is the honest one.
export function relativeError(mean: number, [, hi]: Ci): number {
  return mean > 0 ? (100 * (hi - mean)) / mean : NaN;
}
