import { trimSig } from '../../shared/format/index';

// Older screens import the product's one date-and-time style from here; it lives in shared/format.
export { dateTimeText as dateTime } from '../../shared/format/index';
// Figures for tables: significant digits, never a long float tail.
export function sig(value: number | null | undefined, digits = 3): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return '—';
  if (value === 0) return '0';
  const abs = Math.abs(value);
  if (abs >= 1e-3 && abs < 1e5) return trimSig(value, digits);
  return value.toExponential(digits - 1);
}
