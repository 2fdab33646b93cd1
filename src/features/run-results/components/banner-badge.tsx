import type { Banner } from '../../../../shared/physics/index.ts';
import { BANNER } from '../lib/status.ts';

const SIZE = {
  md: { box: 'gap-1.5 px-2.5 py-1 text-sm', icon: 'h-5 w-5 text-xs' },
  lg: { box: 'gap-3 px-4 py-2.5 text-2xl', icon: 'h-9 w-9 text-xl' },
};

/** Clear / Watch / Act as word, icon and colour together; reused by lists, side by side and the station board. */
export function BannerBadge({ banner, size = 'md' }: { banner: Banner; size?: 'md' | 'lg' }) {
  const b = BANNER[banner];
  const s = SIZE[size];
  return (
    <span data-testid="banner" data-banner={banner} title={b.meaning} className={`inline-flex items-center rounded-full border-2 font-bold ${b.border} ${b.soft} ${b.text} ${s.box}`}>
      <span aria-hidden="true" className={`inline-flex shrink-0 items-center justify-center rounded-full bg-current ${s.icon}`}>
        <span className="text-white">{b.icon}</span>
      </span>
      {b.word}
    </span>
  );
}
