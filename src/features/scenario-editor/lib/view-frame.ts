// Maps room metres (a right, b up) to SVG user units; the view box is fixed so type and strokes keep their size.

export const VIEW_WIDTH = 640;
const MARGIN = 44;
// Tall narrow rooms would push the page down; cap the drawing height and shrink the scale instead.
const MAX_HEIGHT = 480;

export function viewFrame(spanA_m: number, spanB_m: number) {
  const a = spanA_m > 0 ? spanA_m : 1;
  const b = spanB_m > 0 ? spanB_m : 1;
  const scale = Math.min((VIEW_WIDTH - 2 * MARGIN) / a, (MAX_HEIGHT - 2 * MARGIN) / b);
  const height = b * scale + 2 * MARGIN;
  return {
    width: VIEW_WIDTH,
    height,
    scale_pxPerM: scale,
    margin: MARGIN,
    span_m: { a, b },
    toX: (a_m: number) => MARGIN + a_m * scale,
    toY: (b_m: number) => height - MARGIN - b_m * scale,
    fromSvg: (x: number, y: number) => ({ a_m: (x - MARGIN) / scale, b_m: (height - MARGIN - y) / scale }),
  };
}

/** Maps room metres (a right, b up) to SVG user units: the shape viewFrame returns. */
export type ViewFrame = ReturnType<typeof viewFrame>;
