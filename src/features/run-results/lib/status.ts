import type { Banner, ExposureRating } from '../../../../shared/physics/index.ts';

// Icon, word and colour together: status must survive colour-blindness and black-and-white print.
export const BANNER: Record<Banner, { word: string; icon: string; meaning: string; text: string; soft: string; border: string }> = {
  clear: { word: 'Clear', icon: '✓', meaning: 'Upper 95 % bound of the 8-h TWA below half the limit', text: 'text-clear', soft: 'bg-clear-soft', border: 'border-clear' },
  watch: { word: 'Watch', icon: '!', meaning: 'Upper 95 % bound of the 8-h TWA between half the limit and the limit', text: 'text-watch', soft: 'bg-watch-soft', border: 'border-watch' },
  act: { word: 'Act', icon: '✕', meaning: 'Upper 95 % bound of the 8-h TWA above the limit', text: 'text-act', soft: 'bg-act-soft', border: 'border-act' },
};

// AIHA exposure rating category names and bands, on the 95th percentile as a share of the OEL.
export const RATING: Record<ExposureRating, { name: string; band: string }> = {
  0: { name: 'Trivial', band: 'below 1 % of the limit' },
  1: { name: 'Highly controlled', band: '1–10 % of the limit' },
  2: { name: 'Well controlled', band: '10–50 % of the limit' },
  3: { name: 'Controlled', band: '50–100 % of the limit' },
  4: { name: 'Poorly controlled', band: 'above the limit' },
};
