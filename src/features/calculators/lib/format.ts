import { readableNumber, trimSig } from '../../../../shared/format/index';

// Diameters read best in the unit that keeps them between 1 and 1000.
export function displayDiameter(diameter_m: number, digits = 3): string {
  if (diameter_m < 1e-6) return `${readableNumber(diameter_m * 1e9, digits)} nm`;
  if (diameter_m < 1e-3) return `${readableNumber(diameter_m * 1e6, digits)} µm`;
  return `${readableNumber(diameter_m * 1e3, digits)} mm`;
}

// Echoes of what the user typed keep their own precision: "1 s", not "1.00 s".
export const plainNumber = (value: number): string => trimSig(value, 4);
