import { CONTROL_TIERS, type ControlTier } from '../../../../shared/schemas/workspace.ts';

export const TIER_WORDS: Record<ControlTier, string> = {
  elimination: 'Elimination',
  substitution: 'Substitution',
  engineering: 'Engineering control',
  administrative: 'Administrative control',
  respiratory: 'Respiratory protection',
  none: 'No control',
};

// CONTROL_TIERS is already in hierarchy order; an unknown tier from an older record sorts last.
const rank = (tier: string) => {
  const i = CONTROL_TIERS.indexOf(tier as ControlTier);
  return i < 0 ? CONTROL_TIERS.length : i;
};

/** Hierarchy of controls first, then name, then id so equal names keep a stable order. */
export function orderByHierarchy<T extends { controlTier: string; name: string; id: number }>(items: readonly T[]): T[] {
  return [...items].sort((a, b) => rank(a.controlTier) - rank(b.controlTier) || a.name.localeCompare(b.name) || a.id - b.id);
}
