import type { SizeProfileSummary } from '../../../../shared/schemas/size-profiles';
import { metresToMicrometres } from '../../../../shared/units';
import type { Cell } from '@/lib/csv';
import { KIND_LABELS } from '@/features/size-profiles/components/kind-labels';

export const PROFILES_HEADER = [
  'Name',
  'Kind',
  'Fitted MMAD (µm)',
  'Fitted GSD',
  'Respirable (%)',
  'Thoracic (%)',
  'Inhalable (%)',
  'Added (ISO 8601, UTC)',
  'Added by',
];

export const profileRow = (p: SizeProfileSummary): Cell[] => [
  p.name,
  KIND_LABELS[p.kind],
  p.fittedMmad_m === null ? null : metresToMicrometres(p.fittedMmad_m),
  p.fittedGsd,
  100 * p.respirableFraction,
  100 * p.thoracicFraction,
  100 * p.inhalableFraction,
  p.createdAt,
  p.createdBy?.name,
];
