import { render, screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { sequentialScale } from '@/features/run-results/lib/colour-scale';
import { ColourLegend } from './colour-legend';

// On a 390 px phone the legend's 320 px is all the room there is: a band label must not run past its right end.
describe('the colour legend’s band label', () => {
  const scale = sequentialScale([0.1, 12]);
  const label = (from: number, to: number) => {
    const { unmount } = render(
      <ColourLegend scale={scale} unit="m/s" title="Air speed" band={{ from, to, label: 'high release: 2.5–10 m/s' }} />,
    );
    const text = screen.getByTestId('legend-band').querySelector('text')!;
    const out = { anchor: text.getAttribute('text-anchor'), x: Number(text.getAttribute('x')) };
    unmount();
    return out;
  };

  it('starts at the band when the band sits in the left half', () => {
    expect(label(0.5, 2)).toEqual({ anchor: 'start', x: scale.position(0.5) * 320 });
  });

  it('ends at the band’s end (at most the legend’s end) when the band sits in the right half', () => {
    expect(label(8, 10)).toEqual({ anchor: 'end', x: scale.position(10) * 320 });
    expect(label(10, 1000).x).toBeLessThanOrEqual(320);
  });
});
