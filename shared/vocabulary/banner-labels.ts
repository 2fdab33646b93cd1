import type { Banner } from './fractions';

/** `colour` names the design token (--color-clear, --color-clear-soft); the client maps it to its classes. */
export interface BannerLabel {
  word: string;
  icon: string;
  meaning: string;
  colour: Banner;
}

// Icon, word and colour together: status must survive colour-blindness and black-and-white print.
export const BANNER_LABEL: Record<Banner, BannerLabel> = {
  clear: {
    word: 'Clear',
    icon: '✓',
    meaning: 'Daily 95th percentile (from the upper 95 % bound of the 8-h TWA) below half the limit, and the run decided',
    colour: 'clear',
  },
  watch: {
    word: 'Watch',
    icon: '!',
    meaning: 'Daily 95th percentile between half the limit and the limit, or not yet decided',
    colour: 'watch',
  },
  act: {
    word: 'Act',
    icon: '✕',
    meaning: 'Daily 95th percentile (from the upper 95 % bound of the 8-h TWA) above the limit',
    colour: 'act',
  },
};
