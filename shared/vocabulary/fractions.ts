/** Health-related size fractions of ISO 7708 / EN 481, plus the total airborne dust. */
export const FRACTIONS = ['total', 'inhalable', 'thoracic', 'respirable'] as const;
export type Fraction = (typeof FRACTIONS)[number];

/** The fractions an occupational exposure limit can be set for (a limit never applies to "total"). */
export const LIMIT_FRACTIONS = ['inhalable', 'thoracic', 'respirable'] as const;
export type LimitFraction = (typeof LIMIT_FRACTIONS)[number];

/** Where the emitted mass ends up, in the order the engine tallies it. */
export const FATES = ['captured', 'settled', 'exhausted', 'airborne', 'walls'] as const;
export type Fate = (typeof FATES)[number];

export const BANNERS = ['clear', 'watch', 'act'] as const;
export type Banner = (typeof BANNERS)[number];
