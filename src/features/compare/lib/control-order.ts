import { controlTierRank } from '../../../../shared/vocabulary/index';

/** Hierarchy of controls first, then name, then id so equal names keep a stable order. */
export function orderByHierarchy<T extends { controlTier: string; name: string; id: number }>(items: readonly T[]): T[] {
  return [...items].sort(
    (a, b) => controlTierRank(a.controlTier) - controlTierRank(b.controlTier) || a.name.localeCompare(b.name) || a.id - b.id,
  );
}
