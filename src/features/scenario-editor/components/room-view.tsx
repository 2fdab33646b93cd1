import { metres } from '@/features/scenario-editor/lib/format';
import { useRef, type ReactNode } from 'react';
import type { ScenarioInput } from '../../../../shared/schemas/scenario';
import { withHood, withSource, withWorker } from '@/features/scenario-editor/lib/update';
import { viewFrame, type ViewFrame } from '@/features/scenario-editor/lib/view-frame';
import { Draggable } from './draggable';
import { HoodGlyph, SourceGlyph, WorkerGlyph, type ViewKind } from './glyphs';
import { RoomGrid, ScaleBar } from './view-parts';

export type RoomViewProps = { value: ScenarioInput; onChange: (next: ScenarioInput) => void; readOnly?: boolean };

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
  const frame = viewFrame(value.room.length_m, value.room[spec.span]);
  const bName = view === 'plan' ? 'y' : 'height';
  // The second coordinate is y in plan and z in elevation; the same drag writes whichever this view shows.
  const b = (p: { y_m: number; z_m: number }) => (view === 'plan' ? p.y_m : p.z_m);
  const patch = (a_m: number, b_m: number) => (view === 'plan' ? { x_m: a_m, y_m: b_m } : { x_m: a_m, z_m: b_m });
  const label = (what: string, p: { x_m: number; y_m: number; z_m: number }) => `${what}, x ${metres(p.x_m)}, ${bName} ${metres(b(p))}`;
  const common = { svgRef, frame, readOnly };

  return (
    <figure className="flex flex-col gap-2">
      <figcaption className="text-sm font-semibold text-ink">{spec.title}</figcaption>
      <svg
        ref={svgRef}
        viewBox={`0 0 ${frame.width} ${frame.height}`}
        className="h-auto w-full rounded-lg border border-line bg-white select-none"
        role="group"
        aria-label={`${spec.title}, drawn to scale`}
        data-testid={spec.testId}
      >
        <RoomGrid frame={frame} labelA={spec.a} labelB={spec.b} />
        <ScaleBar frame={frame} />
        {overlay?.(frame)}
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
      </svg>
    </figure>
  );
}
