import { type KeyboardEvent, type PointerEvent, type RefObject, useEffect, useRef } from 'react';
import type { ViewZoom } from '@/hooks/use-view-zoom';
import { type Point2, zoomBy } from '@/lib/view-zoom';

type FromSvg = (x: number, y: number) => Point2;

const WHEEL_STEP = 1.2;
// A tenth of the window per arrow key: small enough to keep one's place, large enough to cross a room.
const PAN_SHARE = 0.1;

/**
 * Drag on the drawing's background pans; Ctrl or ⌘ with the wheel (a trackpad pinch) zooms about the
 * pointer; keys on the focused drawing: + and − zoom, arrows pan, 0 shows the whole room. Markers that
 * start their own drag call preventDefault, so grabbing one never pans.
 */
export function useZoomGestures(svgRef: RefObject<SVGSVGElement | null>, v: ViewZoom, scale_pxPerM: number, fromSvg: FromSvg) {
  const drag = useRef<{ x: number; y: number } | null>(null);
  const latest = useRef({ v, scale_pxPerM, fromSvg });
  useEffect(() => {
    latest.current = { v, scale_pxPerM, fromSvg };
  });

  useEffect(() => {
    const svg = svgRef.current;
    if (!svg) return;
    const onWheel = (e: WheelEvent) => {
      if (!e.ctrlKey && !e.metaKey) return;
      e.preventDefault();
      const ctm = svg.getScreenCTM();
      if (!ctm) return;
      const p = new DOMPoint(e.clientX, e.clientY).matrixTransform(ctm.inverse());
      const { v: zoom, fromSvg: toRoom } = latest.current;
      const anchor = toRoom(p.x, p.y);
      zoom.update((z) => zoomBy(z, e.deltaY < 0 ? WHEEL_STEP : 1 / WHEEL_STEP, zoom.span, anchor));
    };
    svg.addEventListener('wheel', onWheel, { passive: false });
    return () => svg.removeEventListener('wheel', onWheel);
  }, [svgRef]);

  const metresPerClientPx = () => {
    const ctm = svgRef.current?.getScreenCTM();
    return ctm && ctm.a > 0 ? 1 / (ctm.a * latest.current.scale_pxPerM) : 0;
  };

  return {
    svg: {
      onPointerDown: (e: PointerEvent<SVGSVGElement>) => {
        if (e.defaultPrevented || e.button !== 0) return;
        drag.current = { x: e.clientX, y: e.clientY };
        e.currentTarget.setPointerCapture?.(e.pointerId);
      },
      onPointerMove: (e: PointerEvent<SVGSVGElement>) => {
        const d = drag.current;
        if (!d) return;
        const m = metresPerClientPx();
        const dx = e.clientX - d.x;
        const dy = e.clientY - d.y;
        drag.current = { x: e.clientX, y: e.clientY };
        // Dragging the paper right shows what lies to the left: the window moves against the pointer.
        if (m > 0 && (dx !== 0 || dy !== 0)) v.pan(-dx * m, dy * m);
      },
      onPointerUp: (e: PointerEvent<SVGSVGElement>) => {
        drag.current = null;
        if (e.currentTarget.hasPointerCapture?.(e.pointerId)) e.currentTarget.releasePointerCapture(e.pointerId);
      },
      onPointerCancel: () => {
        drag.current = null;
      },
    },
    onKeyDown: (e: KeyboardEvent<Element>) => {
      // Keys pressed on a marker inside move the marker, not the view.
      if (e.target !== e.currentTarget) return;
      const w = v.window;
      const step = { a: PAN_SHARE * (w.a1_m - w.a0_m), b: PAN_SHARE * (w.b1_m - w.b0_m) };
      const actions: Record<string, () => void> = {
        '+': v.zoomIn,
        '=': v.zoomIn,
        '-': v.zoomOut,
        '0': v.toWholeRoom,
        ArrowLeft: () => v.pan(-step.a, 0),
        ArrowRight: () => v.pan(step.a, 0),
        ArrowUp: () => v.pan(0, step.b),
        ArrowDown: () => v.pan(0, -step.b),
      };
      const act = actions[e.key];
      if (!act) return;
      e.preventDefault();
      act();
    },
  };
}
