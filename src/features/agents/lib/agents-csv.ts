import type { AgentRecord } from '../../../../shared/schemas/workspace-views';
import type { Cell } from '@/lib/csv';

export const AGENTS_HEADER = [
  'Dust agent',
  'Limit applies to',
  '8-h limit in use (mg/m³)',
  'Published 8-h limit (mg/m³)',
  'Override reason',
  '15-min limit (mg/m³)',
  'Jurisdiction',
  'Limit source',
  'Limit date',
  'Density (kg/m³)',
  'Shape factor',
];

export const agentRow = (a: AgentRecord): Cell[] => [
  a.name,
  a.data.limitFraction,
  a.data.override?.limit8h_mgPerM3 ?? a.data.limit8h_mgPerM3,
  a.data.limit8h_mgPerM3,
  a.data.override?.reason,
  a.data.limit15min_mgPerM3,
  a.data.jurisdiction,
  a.data.limitSource,
  a.data.limitDate,
  a.data.density_kgPerM3,
  a.data.shapeFactor,
];
