import { render, screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { BannerBadge } from './banner-badge';

// The three words come from the README's operator board (Clear / Watch / Act, "in words and icons").
const WORDS = { clear: 'Clear', watch: 'Watch', act: 'Act' } as const;
const banners = Object.keys(WORDS) as (keyof typeof WORDS)[];

const iconOf = (badge: HTMLElement) => badge.querySelector('[aria-hidden="true"]')?.textContent?.trim() ?? '';

describe('banner badge', () => {
  it.each(banners)('shows the word and an icon for %s, at both sizes', (banner) => {
    for (const size of ['md', 'lg'] as const) {
      const { unmount } = render(<BannerBadge banner={banner} size={size} />);
      const badge = screen.getByText(WORDS[banner]);
      expect(iconOf(badge)).not.toBe('');
      unmount();
    }
  });

  it('gives each banner its own icon, so the state reads without colour', () => {
    const icons = banners.map((banner) => {
      const { unmount } = render(<BannerBadge banner={banner} />);
      const icon = iconOf(screen.getByText(WORDS[banner]));
      unmount();
      return icon;
    });
    expect(new Set(icons).size).toBe(3);
  });

  it('says the station has not been run when there is no banner, and shows no banner word', () => {
    const { container } = render(<BannerBadge banner={null} />);
    expect(screen.getByText(/not run/i)).toBeTruthy();
    for (const word of Object.values(WORDS)) expect(container.textContent).not.toContain(word);
  });
});
