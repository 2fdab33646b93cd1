import type { Banner } from '../../shared/schemas/workspace-views';

const LOOK: Record<Banner, { word: string; icon: string; cls: string; help: string }> = {
  clear: { word: 'Clear', icon: '✓', cls: 'border-clear bg-clear-soft text-clear', help: 'Upper 95 % bound of the 8-h TWA is below half the limit' },
  watch: { word: 'Watch', icon: '!', cls: 'border-watch bg-watch-soft text-watch', help: 'Upper 95 % bound of the 8-h TWA is between half the limit and the limit' },
  act: { word: 'Act', icon: '✕', cls: 'border-act bg-act-soft text-act', help: 'Upper 95 % bound of the 8-h TWA is above the limit' },
};

// Word and icon as well as colour, so the state reads without colour vision.
export function BannerBadge({ banner, size = 'md' }: { banner: Banner | null | undefined; size?: 'md' | 'lg' }) {
  if (!banner) return <span className="text-sm text-muted">Not run</span>;
  const look = LOOK[banner];
  const big = size === 'lg';
  return (
    <span title={look.help} className={`inline-flex items-center gap-1.5 rounded-full border font-bold ${look.cls} ${big ? 'px-5 py-2 text-2xl' : 'px-2.5 py-0.5 text-xs'}`}>
      <span aria-hidden="true">{look.icon}</span>
      {look.word}
    </span>
  );
}

export const bannerHelp = (banner: Banner) => LOOK[banner].help;
