import type { ScenarioInput } from '../../../../shared/schemas/scenario';
import { isControlTier, type ControlTier } from '../../../../shared/vocabulary/control-tiers';

/** A stored tier as one of ours; an unknown word from an older record reads as no control until someone picks one. */
export const tierOf = (tier: string): ControlTier => (isControlTier(tier) ? tier : 'none');

/**
 * The first hood added to an option that still says "no control" makes it an engineering control; a tier the
 * engineer chose, or a change that keeps the hood count above zero, is left alone.
 */
export function tierAfterEdit(tier: ControlTier, before: Pick<ScenarioInput, 'hoods'>, after: Pick<ScenarioInput, 'hoods'>): ControlTier {
  const had = (before.hoods ?? []).length > 0;
  const has = (after.hoods ?? []).length > 0;
  return tier === 'none' && !had && has ? 'engineering' : tier;
}
