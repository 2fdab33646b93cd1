import type { ExposureRating } from '../physics/exposure';

// AIHA exposure rating category names and bands, on the 95th percentile as a share of the OEL.
export const RATING_LABEL: Record<ExposureRating, { name: string; band: string }> = {
  0: { name: 'Trivial', band: 'below 1 % of the limit' },
  1: { name: 'Highly controlled', band: '1–10 % of the limit' },
  2: { name: 'Well controlled', band: '10–50 % of the limit' },
  3: { name: 'Controlled', band: '50–100 % of the limit' },
  4: { name: 'Poorly controlled', band: 'above the limit' },
};
