import type { ReactNode, RefObject } from 'react';
import { useDrag } from '@/features/scenario-editor/hooks/use-drag';
import type { ViewFrame } from '@/features/scenario-editor/lib/view-frame';

type Props = {
  svgRef: RefObject<SVGSVGElement | null>;
  frame: ViewFrame;
  at: { a_m: number; b_m: number };
  onMove: (a_m: number, b_m: number) => void;
  label: string;
  testId: string;
  readOnly?: boolean;
  children: ReactNode;
};

// A ring drawn only on keyboard focus: outlines on SVG groups are unreliable across browsers.
export function Draggable({ svgRef, frame, at, onMove, label, testId, readOnly, children }: Props) {
  const handlers = useDrag({ svgRef, frame, at, onMove, disabled: readOnly });
  return (
    <g
      role="button"
      aria-roledescription="draggable marker"
      aria-label={label}
      aria-disabled={readOnly || undefined}
      tabIndex={readOnly ? -1 : 0}
      data-testid={testId}
      className={`group outline-none ${readOnly ? '' : 'cursor-grab active:cursor-grabbing'}`}
      style={{ touchAction: 'none' }}
      {...handlers}
    >
      <rect
        x={frame.toX(at.a_m) - 16}
        y={frame.toY(at.b_m) - 16}
        width={32}
        height={32}
        rx={6}
        className="fill-transparent stroke-accent opacity-0 group-focus-visible:opacity-100"
        strokeWidth={2.5}
        strokeDasharray="4 3"
      />
      {children}
    </g>
  );
}
