import { percentText, trimSig } from '../../../../shared/format/index';
import { hoodKindLabel } from '../../../../shared/vocabulary/index';
import { sig } from '@/lib/format';
import type { HoodFigures } from './types';

export const airflow_m3PerH = (airflow_m3PerS: number) => airflow_m3PerS * 3600;

export const hoodText = (h: HoodFigures) =>
  `${hoodKindLabel(h.kind)}, ${Math.round(airflow_m3PerH(h.airflow_m3PerS))} m³/h, face ${sig(h.faceWidth_m)} × ${sig(h.faceHeight_m)} m`;

export const fanPowerText = (power_W: number) => (power_W >= 1000 ? `${sig(power_W / 1000, 2)} kW` : `${Math.round(power_W)} W`);

export const share = (fraction: number) => percentText(100 * fraction);

// Plain decimals down to a micro-unit read faster in a table than 5.67e-4.
export const plain = (value: number, digits = 3) => (Number.isFinite(value) ? trimSig(value, digits) : '—');
