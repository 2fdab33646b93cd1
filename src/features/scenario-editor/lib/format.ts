import { formatSig, trimSig } from '../../../../shared/format/index';

// Six significant digits hide binary noise such as 19.999999999999977 °C without losing typed precision.
export function formatInput(value: number | undefined): string {
  if (value === undefined || !Number.isFinite(value)) return '';
  return trimSig(value, 6);
}

export const metres = (v_m: number) => `${v_m.toFixed(2)} m`;
export const speed = (v_mPerS: number) => `${formatSig(v_mPerS, 2)} m/s`;
