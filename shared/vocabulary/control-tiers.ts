/** The hierarchy of controls, most effective first; "none" sorts last. */
export const CONTROL_TIERS = ['elimination', 'substitution', 'engineering', 'administrative', 'respiratory', 'none'] as const;
export type ControlTier = (typeof CONTROL_TIERS)[number];

export const CONTROL_TIER_LABEL: Record<ControlTier, string> = {
  elimination: 'Elimination',
  substitution: 'Substitution',
  engineering: 'Engineering control',
  administrative: 'Administrative control',
  respiratory: 'Respiratory protection',
  none: 'No control',
};

export const isControlTier = (tier: string): tier is ControlTier => (CONTROL_TIERS as readonly string[]).includes(tier);

// An unknown tier from an older record sorts after every known one.
export const controlTierRank = (tier: string): number => (isControlTier(tier) ? CONTROL_TIERS.indexOf(tier) : CONTROL_TIERS.length);

export const controlTierLabel = (tier: string): string => (isControlTier(tier) ? CONTROL_TIER_LABEL[tier] : tier);
