import { useCallback, useState } from 'react';
import { clampZoom, fitPoints, panBy, type Point2, type Span, wholeRoom, windowOf, type Zoom, zoomBy, ZOOM_STEP } from '@/lib/view-zoom';

export type ViewZoom = ReturnType<typeof useViewZoom>;

/**
 * Zoom state of one room drawing. It opens on the workstation (the focus points) and then stays put:
 * following the markers would rescale the drawing under a marker being dragged.
 */
export function useViewZoom(span: Span, focus: readonly Point2[]) {
  const [chosen, setChosen] = useState<Zoom>(() => fitPoints(focus, span));
  const zoom = clampZoom(chosen, span);
  const { a_m, b_m } = span;
  const update = useCallback((f: (z: Zoom) => Zoom) => setChosen((prev) => f(clampZoom(prev, { a_m, b_m }))), [a_m, b_m]);
  return {
    zoom,
    window: windowOf(zoom, span),
    span,
    update,
    zoomIn: () => update((z) => zoomBy(z, ZOOM_STEP, span)),
    zoomOut: () => update((z) => zoomBy(z, 1 / ZOOM_STEP, span)),
    pan: (da_m: number, db_m: number) => update((z) => panBy(z, da_m, db_m, span)),
    toWorkstation: () => setChosen(fitPoints(focus, span)),
    toWholeRoom: () => setChosen(wholeRoom(span)),
  };
}
