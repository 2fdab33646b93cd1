import { metres } from '@/features/scenario-editor/lib/format';
import { useId, useRef, type ReactNode } from 'react';
import type { ScenarioInput } from '../../../../shared/schemas/scenario';
import { withHood, withSource, withWorker } from '@/features/scenario-editor/lib/update';
import { viewFrame, type ViewFrame } from '@/features/scenario-editor/lib/view-frame';
import { faceCorners } from '@/features/scenario-editor/lib/hood-axis';
import { ZoomControls } from '@/components/zoom-controls';
import { useViewZoom } from '@/hooks/use-view-zoom';
import { useZoomGestures } from '@/hooks/use-zoom-gestures';
import type { Point2 } from '@/lib/view-zoom';
import { Draggable } from './draggable';
import { HoodGlyph, project, SourceGlyph, WorkerGlyph, type ViewKind } from './glyphs';
import { RoomGrid, ScaleBar } from './view-parts';

export type RoomViewProps = { value: ScenarioInput; onChange: (next: ScenarioInput) => void; readOnly?: boolean };

// The workstation the views open on: source, breathing zone and hood faces.
function focusPoints(value: ScenarioInput, view: ViewKind): Point2[] {
  const b = (p: { y_m: number; z_m: number }) => (view === 'plan' ? p.y_m : p.z_m);
  const r = value.worker.radius_m ?? 0.3;
  const points: Point2[] = [
    { a_m: value.source.x_m, b_m: b(value.source) },
    { a_m: value.worker.x_m - r, b_m: b(value.worker) - r },
    { a_m: value.worker.x_m + r, b_m: b(value.worker) + r },
  ];
  for (const hood of value.hoods ?? [])
    for (const c of faceCorners(hood)) {
      const q = project(c, view);
      points.push({ a_m: q.a, b_m: q.b });
    }
  return points.filter((p) => Number.isFinite(p.a_m) && Number.isFinite(p.b_m));
}

const VIEWS = {
  plan: { a: 'x', b: 'y', span: 'width_m', title: 'Plan (x–y), seen from above', testId: 'plan-view' },
  elevation: { a: 'x', b: 'z', span: 'height_m', title: 'Elevation (x–z), looking toward +y', testId: 'elevation-view' },
} as const;

export function RoomView({
  view,
  value,
  onChange,
  readOnly,
  overlay,
}: RoomViewProps & { view: ViewKind; overlay?: (frame: ViewFrame) => ReactNode }) {
  const svgRef = useRef<SVGSVGElement>(null);
  const spec = VIEWS[view];
  const whole = viewFrame(value.room.length_m, value.room[spec.span]);
  const zoom = useViewZoom({ a_m: whole.span_m.a, b_m: whole.span_m.b }, focusPoints(value, view));
  const frame = viewFrame(value.room.length_m, value.room[spec.span], zoom.window);
  const gestures = useZoomGestures(svgRef, zoom, frame.scale_pxPerM, frame.fromSvg);
  const clipId = `room-clip-${useId().replace(/[^\w-]/g, '')}`;
  const what = view === 'plan' ? 'plan' : 'elevation';
  const bName = view === 'plan' ? 'y' : 'height';
  // The second coordinate is y in plan and z in elevation; the same drag writes whichever this view shows.
  const b = (p: { y_m: number; z_m: number }) => (view === 'plan' ? p.y_m : p.z_m);
  const patch = (a_m: number, b_m: number) => (view === 'plan' ? { x_m: a_m, y_m: b_m } : { x_m: a_m, z_m: b_m });
  const label = (what: string, p: { x_m: number; y_m: number; z_m: number }) => `${what}, x ${metres(p.x_m)}, ${bName} ${metres(b(p))}`;
  const common = { svgRef, frame, readOnly };

  return (
    <figure className="flex min-w-0 flex-col gap-2">
      <figcaption className="text-sm font-semibold text-ink">{spec.title}</figcaption>
      <ZoomControls v={zoom} what={what} />
      <svg
        ref={svgRef}
        viewBox={`0 0 ${frame.width} ${frame.height}`}
        className="h-auto w-full rounded-lg border border-line bg-white select-none focus-visible:outline-3 focus-visible:outline-accent"
        style={{ touchAction: 'pan-y' }}
        role="group"
        tabIndex={0}
        aria-label={`${spec.title}, drawn to scale; plus and minus keys zoom, arrow keys pan`}
        data-testid={spec.testId}
        data-zoom={zoom.zoom.k.toFixed(3)}
        onKeyDown={gestures.onKeyDown}
        {...gestures.svg}
      >
        <defs>
          <clipPath id={clipId}>
            <rect x={frame.plot.x0} y={frame.plot.y1} width={frame.plot.x1 - frame.plot.x0} height={frame.plot.y0 - frame.plot.y1} />
          </clipPath>
        </defs>
        <RoomGrid frame={frame} labelA={spec.a} labelB={spec.b} clipId={clipId} />
        <ScaleBar frame={frame} />
        {overlay?.(frame)}
        <g clipPath={`url(#${clipId})`}>
          <Draggable
            {...common}
            testId="drag-worker"
            label={label("Worker's head", value.worker)}
            at={{ a_m: value.worker.x_m, b_m: b(value.worker) }}
            onMove={(a_m, b_m) => onChange(withWorker(value, patch(a_m, b_m)))}
          >
            <WorkerGlyph worker={value.worker} frame={frame} view={view} />
          </Draggable>
          {(value.hoods ?? []).map((hood, i) => (
            <Draggable
              key={i}
              {...common}
              testId={`drag-hood-${i}`}
              label={label(`Hood ${i + 1}`, hood)}
              at={{ a_m: hood.x_m, b_m: b(hood) }}
              onMove={(a_m, b_m) => onChange(withHood(value, i, patch(a_m, b_m)))}
            >
              <HoodGlyph hood={hood} index={i} frame={frame} view={view} />
            </Draggable>
          ))}
          <Draggable
            {...common}
            testId="drag-source"
            label={label('Source', value.source)}
            at={{ a_m: value.source.x_m, b_m: b(value.source) }}
            onMove={(a_m, b_m) => onChange(withSource(value, patch(a_m, b_m)))}
          >
            <SourceGlyph source={value.source} frame={frame} view={view} />
          </Draggable>
        </g>
      </svg>
    </figure>
  );
}
