export * from './banner-labels.ts';
export * from './control-tiers.ts';
export * from './fate-labels.ts';
export * from './fraction-labels.ts';
export * from './fractions.ts';
export * from './hood-kinds.ts';
export * from './rating-categories.ts';
export * from './release-types.ts';
