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
  clear: { word: 'Clear', icon: '✓', meaning: 'Upper 95 % bound of the 8-h TWA below half the limit', colour: 'clear' },
  watch: { word: 'Watch', icon: '!', meaning: 'Upper 95 % bound of the 8-h TWA between half the limit and the limit', colour: 'watch' },
  act: { word: 'Act', icon: '✕', meaning: 'Upper 95 % bound of the 8-h TWA above the limit', colour: 'act' },
};
