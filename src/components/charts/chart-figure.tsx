import { Group } from '@visx/group';
import type { ReactNode } from 'react';
import { type AxesSpec, ChartAxes } from './chart-axes';

export type ChartBox = { width: number; height: number; margin: { top: number; right: number; bottom: number; left: number } };

export const plotSize = ({ width, height, margin }: ChartBox) => ({
  innerW: width - margin.left - margin.right,
  innerH: height - margin.top - margin.bottom,
});

const FIGURE = 'rounded-lg border border-line bg-white p-3';
const UNBROKEN = 'print:break-inside-avoid';

type Props = {
  box: ChartBox;
  caption: ReactNode;
  label: string;
  axes: AxesSpec;
  footer?: ReactNode;
  testId?: string;
  /** For charts in a printed report, where a chart split over two pages cannot be read. */
  unbroken?: boolean;
  children: ReactNode;
};

// The caption and any note below stay HTML, outside the drawing, so they wrap and read as text; the axes go last, over the data.
export function ChartFigure({ box, caption, label, axes, footer, testId, unbroken, children }: Props) {
  return (
    <figure className={unbroken ? `${FIGURE} ${UNBROKEN}` : FIGURE}>
      {caption}
      <svg viewBox={`0 0 ${box.width} ${box.height}`} className="h-auto w-full" role="img" aria-label={label} data-testid={testId}>
        <Group left={box.margin.left} top={box.margin.top}>
          {children}
          <ChartAxes {...axes} innerH={plotSize(box).innerH} />
        </Group>
      </svg>
      {footer}
    </figure>
  );
}
