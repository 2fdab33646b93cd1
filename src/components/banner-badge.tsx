import type { Banner } from '../../shared/vocabulary/fractions';
import { BANNER_LABEL } from '../../shared/vocabulary/banner-labels';

// Tailwind only keeps class names it can read whole, so each token's classes are spelled out here.
export const BANNER_CLASSES: Record<Banner, { text: string; soft: string; border: string }> = {
  clear: { text: 'text-clear', soft: 'bg-clear-soft', border: 'border-clear' },
  watch: { text: 'text-watch', soft: 'bg-watch-soft', border: 'border-watch' },
  act: { text: 'text-act', soft: 'bg-act-soft', border: 'border-act' },
};

const SIZE = {
  md: { box: 'gap-1.5 px-2.5 py-1 text-sm', icon: 'h-5 w-5 text-xs' },
  lg: { box: 'gap-3 px-4 py-2.5 text-2xl', icon: 'h-9 w-9 text-xl' },
};

/** Clear / Watch / Act as word, icon and colour together, so the state reads without colour vision. */
export function BannerBadge({ banner, size = 'md' }: { banner: Banner | null | undefined; size?: 'md' | 'lg' }) {
  if (!banner) return <span className="text-sm text-muted">Not run</span>;
  const b = BANNER_LABEL[banner];
  const c = BANNER_CLASSES[b.colour];
  const s = SIZE[size];
  return (
    <span
      data-testid="banner"
      data-banner={banner}
      title={b.meaning}
      className={`inline-flex items-center rounded-full border-2 font-bold ${c.border} ${c.soft} ${c.text} ${s.box}`}
    >
      <span aria-hidden="true" className={`inline-flex shrink-0 items-center justify-center rounded-full bg-current ${s.icon}`}>
        <span className="text-white">{b.icon}</span>
      </span>
      {b.word}
    </span>
  );
}
