import type { Scenario } from '../../../../shared/schemas/scenario';
import { cubicMetresPerSecondToPerHour, metresToMillimetres } from '../../../../shared/units';
import { HOOD_KIND_LABEL } from '../../../../shared/vocabulary/index';
import type { Cell } from '@/lib/csv';

export const HOODS_HEADER = [
  'Hood',
  'Type',
  'Face width (mm)',
  'Face height (mm)',
  'Face centre x (m)',
  'Face centre y (m)',
  'Face centre height (m)',
  'Facing',
  'Airflow (m³/h)',
  'Face velocity (m/s)',
];

// The direction is given either as a vector or as two angles; the file says which, in its own words.
const facing = (d: Scenario['hoods'][number]['direction']) =>
  'azimuth_deg' in d ? `azimuth ${d.azimuth_deg}°, elevation ${d.elevation_deg}°` : `vector (${d.x}, ${d.y}, ${d.z})`;

export const hoodCsvRows = (s: Scenario): Cell[][] =>
  s.hoods.map((h, i) => [
    h.name ?? `Hood ${i + 1}`,
    HOOD_KIND_LABEL[h.kind],
    metresToMillimetres(h.faceWidth_m),
    metresToMillimetres(h.faceHeight_m),
    h.x_m,
    h.y_m,
    h.z_m,
    facing(h.direction),
    cubicMetresPerSecondToPerHour(h.airflow_m3PerS),
    h.airflow_m3PerS / (h.faceWidth_m * h.faceHeight_m),
  ]);
