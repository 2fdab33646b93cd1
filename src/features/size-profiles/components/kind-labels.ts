import type { ProfileKind } from '../../../../shared/size-profiles/index';

export const KIND_LABELS: Record<ProfileKind, string> = {
  impactor: 'Cascade-impactor stages',
  counter: 'Optical counter bins',
  bins: 'Plain mass bins',
  lognormal: 'Lognormal',
  respirable: 'Respirable fraction only',
};
