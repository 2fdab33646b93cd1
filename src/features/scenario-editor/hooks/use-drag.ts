import { useRef, type KeyboardEvent, type PointerEvent, type RefObject } from 'react';
import { nudgeFor, nudgeInside, snapFor, snapInside } from '@/features/scenario-editor/lib/snap';
import type { ViewFrame } from '@/features/scenario-editor/lib/view-frame';

type Args = {
  svgRef: RefObject<SVGSVGElement | null>;
  frame: ViewFrame;
  at: { a_m: number; b_m: number };
  onMove: (a_m: number, b_m: number) => void;
  disabled?: boolean;
};

// Pointer drags snap to the 5 cm grid (1 cm when zoomed in); keys nudge by exact steps so a typed 1.72 m becomes 1.77 m, not 1.75 m.
export function useDrag({ svgRef, frame, at, onMove, disabled }: Args) {
  const grab = useRef<{ da: number; db: number; last: string } | null>(null);

  const toRoom = (e: PointerEvent) => {
    const ctm = svgRef.current?.getScreenCTM();
    if (!ctm) return null;
    const p = new DOMPoint(e.clientX, e.clientY).matrixTransform(ctm.inverse());
    return frame.fromSvg(p.x, p.y);
  };

  if (disabled) return {};
  return {
    onPointerDown: (e: PointerEvent<SVGGElement>) => {
      const r = toRoom(e);
      if (!r || e.button !== 0) return;
      e.currentTarget.setPointerCapture(e.pointerId);
      // Keep the grab offset so the marker does not jump under the pointer.
      grab.current = { da: r.a_m - at.a_m, db: r.b_m - at.b_m, last: '' };
      e.preventDefault();
    },
    onPointerMove: (e: PointerEvent<SVGGElement>) => {
      const g = grab.current;
      const r = g && toRoom(e);
      if (!g || !r) return;
      const step = snapFor(frame.scale_pxPerM);
      const a = snapInside(r.a_m - g.da, frame.span_m.a, step);
      const b = snapInside(r.b_m - g.db, frame.span_m.b, step);
      const key = `${a},${b}`;
      if (key === g.last) return;
      g.last = key;
      onMove(a, b);
    },
    onPointerUp: (e: PointerEvent<SVGGElement>) => {
      grab.current = null;
      if (e.currentTarget.hasPointerCapture(e.pointerId)) e.currentTarget.releasePointerCapture(e.pointerId);
    },
    onPointerCancel: () => {
      grab.current = null;
    },
    onKeyDown: (e: KeyboardEvent<SVGGElement>) => {
      const step = nudgeFor(e.key, e.shiftKey);
      if (!step) return;
      e.preventDefault();
      onMove(nudgeInside(at.a_m, step.da, frame.span_m.a), nudgeInside(at.b_m, step.db, frame.span_m.b));
    },
  };
}
