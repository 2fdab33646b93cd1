export * from './banner-labels';
export * from './control-tiers';
export * from './fate-labels';
export * from './fraction-labels';
export * from './fractions';
export * from './hood-kinds';
export * from './rating-categories';
export * from './release-types';
