// Maps room metres (a right, b up) to SVG user units; the view box is fixed so type and strokes keep their size.
import type { ViewWindow } from '@/lib/view-zoom';

export const VIEW_WIDTH = 640;
const MARGIN = 44;
// Tall narrow rooms would push the page down; cap the drawing height and shrink the scale instead.
const MAX_HEIGHT = 480;

/** The whole room fills the drawing area; a zoom window (same proportions) fills the same area at a larger scale. */
export function viewFrame(spanA_m: number, spanB_m: number, zoomed?: ViewWindow) {
  const a = spanA_m > 0 ? spanA_m : 1;
  const b = spanB_m > 0 ? spanB_m : 1;
  const base = Math.min((VIEW_WIDTH - 2 * MARGIN) / a, (MAX_HEIGHT - 2 * MARGIN) / b);
  const height = b * base + 2 * MARGIN;
  const w = zoomed ?? { a0_m: 0, a1_m: a, b0_m: 0, b1_m: b };
  const scale = (base * a) / (w.a1_m - w.a0_m);
  return {
    width: VIEW_WIDTH,
    height,
    scale_pxPerM: scale,
    margin: MARGIN,
    span_m: { a, b },
    window: w,
    /** The drawing area in SVG units: everything in room metres is clipped to it. */
    plot: { x0: MARGIN, x1: MARGIN + a * base, y0: height - MARGIN, y1: MARGIN },
    toX: (a_m: number) => MARGIN + (a_m - w.a0_m) * scale,
    toY: (b_m: number) => height - MARGIN - (b_m - w.b0_m) * scale,
    fromSvg: (x: number, y: number) => ({ a_m: w.a0_m + (x - MARGIN) / scale, b_m: w.b0_m + (height - MARGIN - y) / scale }),
  };
}

/** Maps room metres (a right, b up) to SVG user units: the shape viewFrame returns. */
export type ViewFrame = ReturnType<typeof viewFrame>;
