import { powerOfTen, readableNumber, trimSig } from '../../../../shared/format/index';

// Log axes read best with one labelled tick per decade.
export function decadeTicks(min: number, max: number): number[] {
  const ticks: number[] = [];
  for (let e = Math.ceil(Math.log10(min) - 1e-9); e <= Math.floor(Math.log10(max) + 1e-9); e++) ticks.push(10 ** e);
  return ticks;
}

export function logSpace(min: number, max: number, count: number): number[] {
  const a = Math.log10(min);
  const step = (Math.log10(max) - a) / (count - 1);
  return Array.from({ length: count }, (_, i) => 10 ** (a + i * step));
}

const DIAMETER_LABELS: Record<number, string> = {
  [-9]: '1 nm',
  [-8]: '10 nm',
  [-7]: '100 nm',
  [-6]: '1 µm',
  [-5]: '10 µm',
  [-4]: '100 µm',
  [-3]: '1 mm',
};

export const diameterTick = (d_m: number): string => DIAMETER_LABELS[Math.round(Math.log10(d_m))] ?? readableNumber(d_m);

export const powerTick = powerOfTen;

// Round tick values print without float noise (0.15000000000000002 → 0.15).
export const plainTick = (value: number): string => trimSig(value, 3);
