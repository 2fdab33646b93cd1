import type { ExposureRating } from '../physics/exposure';

/**
 * Exposure rating categories 0–4 and their bands on the 95th percentile as a share of the OEL, from AIHA,
 * "A Strategy for Assessing and Managing Occupational Exposures", 4th ed. (band edges from memory). The short
 * names are our own plain words, not the book's.
 */
export const RATING_LABEL: Record<ExposureRating, { name: string; band: string }> = {
  0: { name: 'Far below the limit', band: 'below 1 % of the limit' },
  1: { name: 'Well below the limit', band: '1–10 % of the limit' },
  2: { name: 'Under half the limit', band: '10–50 % of the limit' },
  3: { name: 'Near the limit', band: '50–100 % of the limit' },
  4: { name: 'Over the limit', band: 'above the limit' },
};
