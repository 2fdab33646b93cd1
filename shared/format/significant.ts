// Plain decimals read better in tables; exponents only where a decimal would need many zeros.
export function formatSig(value: number, digits: number): string {
  if (!Number.isInteger(digits) || digits < 1 || digits > 21) {
    throw new RangeError(`digits must be an integer from 1 to 21, got ${String(digits)}`);
  }
  if (!Number.isFinite(value)) return Number.isNaN(value) ? 'NaN' : value > 0 ? '∞' : '−∞';
  if (value === 0) return '0';
  const rounded = Number(value.toPrecision(digits));
  const exponent = Math.floor(Math.log10(Math.abs(rounded)));
  if (exponent < -4 || exponent >= 15) return rounded.toExponential(digits - 1);
  return rounded.toFixed(Math.max(0, digits - 1 - exponent));
}

// Echoes of what was typed, and axis ticks, drop the zeros formatSig keeps: "1 s", not "1.00 s".
export const trimSig = (value: number, digits: number): string => String(Number(value.toPrecision(digits)));
