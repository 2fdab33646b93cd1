import { BANNER_LABEL } from '../../../../shared/vocabulary/index';
import type { RunListItem } from '../../../../shared/schemas/workspace-views';
import type { Cell } from '@/lib/csv';

export const SAVED_RUNS_HEADER = [
  'Saved (ISO 8601, UTC)',
  'Limit fraction',
  '8-h TWA (mg/m³)',
  '8-h TWA 95 % CI low (mg/m³)',
  '8-h TWA 95 % CI high (mg/m³)',
  '% of limit',
  'Banner',
  'Particles',
  'Seed',
  'Engine',
  'Inputs',
];

export const savedRunRow = (r: RunListItem): Cell[] => [
  r.created_at,
  r.limit_fraction,
  r.twa8h_mgPerM3,
  r.twa8h_lo_mgPerM3,
  r.twa8h_hi_mgPerM3,
  r.percent_of_limit,
  r.banner ? BANNER_LABEL[r.banner].word : null,
  r.particles,
  r.seed,
  r.engine_version,
  r.outOfDate ? 'out of date' : 'current',
];
