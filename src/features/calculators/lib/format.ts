import { formatSig } from '../../../../shared/units.ts';

const SUPERSCRIPT: Record<string, string> = { '-': '⁻', '0': '⁰', '1': '¹', '2': '²', '3': '³', '4': '⁴', '5': '⁵', '6': '⁶', '7': '⁷', '8': '⁸', '9': '⁹' };

// Engineers read 2.70 × 10⁻¹¹ faster than 2.70e-11; plain decimals stay plain.
export function displayNumber(value: number, digits = 3): string {
  const text = formatSig(value, digits);
  const match = /^(-?[\d.]+)e([+-]\d+)$/.exec(text);
  if (!match) return text;
  const exponent = String(Number(match[2])).replace(/./g, (c) => SUPERSCRIPT[c] ?? c);
  return `${match[1]} × 10${exponent}`;
}

export const displayPercent = (fraction: number): string => (fraction * 100).toFixed(1);

// Diameters read best in the unit that keeps them between 1 and 1000.
export function displayDiameter(diameter_m: number, digits = 3): string {
  if (diameter_m < 1e-6) return `${displayNumber(diameter_m * 1e9, digits)} nm`;
  if (diameter_m < 1e-3) return `${displayNumber(diameter_m * 1e6, digits)} µm`;
  return `${displayNumber(diameter_m * 1e3, digits)} mm`;
}

// Echoes of what the user typed keep their own precision: "1 s", not "1.00 s".
export const plainNumber = (value: number): string => String(Number(value.toPrecision(4)));

// Decade ticks on log axes: 10⁻⁵ rather than a mix of 0.001 and 1 × 10⁻⁵.
export function powerOfTen(value: number): string {
  const exponent = Math.round(Math.log10(value));
  if (exponent === 0) return '1';
  if (exponent === 1) return '10';
  return `10${String(exponent).replace(/./g, (c) => SUPERSCRIPT[c] ?? c)}`;
}
