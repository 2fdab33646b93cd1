import { Group } from '@visx/group';
import type { ReactNode } from 'react';

export type ChartBox = { width: number; height: number; margin: { top: number; right: number; bottom: number; left: number } };

export const plotSize = ({ width, height, margin }: ChartBox) => ({
  innerW: width - margin.left - margin.right,
  innerH: height - margin.top - margin.bottom,
});

// The caption and any note below stay HTML, outside the drawing, so they wrap and read as text.
export function ChartFigure({
  box,
  caption,
  label,
  children,
  footer,
}: {
  box: ChartBox;
  caption: ReactNode;
  label: string;
  children: ReactNode;
  footer?: ReactNode;
}) {
  return (
    <figure className="rounded-lg border border-line bg-white p-3">
      {caption}
      <svg viewBox={`0 0 ${box.width} ${box.height}`} className="h-auto w-full" role="img" aria-label={label}>
        <Group left={box.margin.left} top={box.margin.top}>
          {children}
        </Group>
      </svg>
      {footer}
    </figure>
  );
}
