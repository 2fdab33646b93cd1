import type { ViewZoom } from '@/hooks/use-view-zoom';
import { trimSig } from '../../shared/format/index';
import { MAX_ZOOM } from '@/lib/view-zoom';

const BUTTON =
  'rounded-md border border-line bg-white px-2.5 py-1 text-sm font-semibold text-ink hover:bg-paper-deep disabled:cursor-not-allowed disabled:text-muted focus-visible:outline-3 focus-visible:outline-accent';

/** Buttons for one drawing's zoom; `what` names the drawing so several sets on a page stay distinguishable. */
export function ZoomControls({ v, what }: { v: ViewZoom; what: string }) {
  const k = v.zoom.k;
  return (
    <div role="group" aria-label={`Zoom of the ${what}`} className="no-print flex flex-wrap items-center gap-1.5">
      <button type="button" className={BUTTON} onClick={v.zoomOut} disabled={k <= 1.0001} aria-label={`Zoom out of the ${what}`}>
        −
      </button>
      <button type="button" className={BUTTON} onClick={v.zoomIn} disabled={k >= MAX_ZOOM - 1e-6} aria-label={`Zoom in on the ${what}`}>
        +
      </button>
      <button type="button" className={BUTTON} onClick={v.toWorkstation}>
        Workstation
      </button>
      <button type="button" className={BUTTON} onClick={v.toWholeRoom} disabled={k <= 1.0001}>
        Whole room
      </button>
      <output className="ml-1 text-xs text-muted tabular-nums" aria-live="polite" data-testid="zoom-level">
        {trimSig(k, 2)}×
      </output>
    </div>
  );
}
