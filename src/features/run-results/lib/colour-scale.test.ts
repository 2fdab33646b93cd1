import { describe, expect, it } from 'vitest';
import { niceCeil, RAMP, rampColour, sequentialScale } from './colour-scale';

const luminance = (rgb: string) => {
  const [r, g, b] = rgb.match(/\d+/g)!.map(Number);
  return 0.2126 * r + 0.7152 * g + 0.0722 * b;
};

describe('sequential colour scale', () => {
  it('runs from the first to the last ramp stop and darkens monotonically', () => {
    expect(rampColour(0)).toBe('rgb(243, 239, 226)');
    expect(rampColour(1)).toBe('rgb(28, 70, 86)');
    const l = Array.from({ length: 21 }, (_, i) => luminance(rampColour(i / 20)));
    for (let i = 1; i < l.length; i++) expect(l[i]).toBeLessThan(l[i - 1]);
    expect(RAMP).toHaveLength(6);
  });

  it('goes logarithmic when the values span more than two decades, with decade ticks', () => {
    const s = sequentialScale([0, 0.002, 0.05, 0.87]);
    expect(s.log).toBe(true);
    expect(s.ticks).toEqual([0.001, 0.01, 0.1, 1]);
    expect(s.position(0.01)).toBeCloseTo(1 / 3, 12);
    expect(s.position(0)).toBe(0);
  });

  it('stays linear over a narrow range and rounds the top to a nice number', () => {
    const s = sequentialScale([0.3, 1.1, 2.7]);
    expect(s.log).toBe(false);
    expect(s.max).toBe(5);
    expect(s.ticks).toEqual([0, 1.25, 2.5, 3.75, 5]);
    expect(niceCeil(2.3)).toBe(2.5);
    expect(niceCeil(0.061)).toBeCloseTo(0.1, 12);
  });

  it('paints an all-zero map in the lightest colour', () => {
    expect(sequentialScale([0, 0]).colour(0)).toBe(RAMP[0]);
  });
});
