// SVG cannot read Tailwind classes for fills, so the theme tokens are passed as CSS variables.
export const INK = 'var(--color-ink)';
export const MUTED = 'var(--color-muted)';
export const LINE = 'var(--color-line)';
export const PAPER = 'var(--color-paper)';
export const PAPER_DEEP = 'var(--color-paper-deep)';
export const ACCENT = 'var(--color-accent)';
export const ACCENT_SOFT = 'var(--color-accent-soft)';
export const CLEAR_SOFT = 'var(--color-clear-soft)';
export const WATCH = 'var(--color-watch)';
export const ACT = 'var(--color-act)';

export const tickLabel = { fill: MUTED, fontSize: 11, fontFamily: 'inherit' } as const;
export const axisLabel = { fill: INK, fontSize: 12, fontWeight: 600, fontFamily: 'inherit' } as const;
// A paper-coloured halo keeps labels readable where they cross a curve.
export const halo = { stroke: 'white', strokeWidth: 4, paintOrder: 'stroke' } as const;
