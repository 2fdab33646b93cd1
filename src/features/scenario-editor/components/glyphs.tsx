import type { ScenarioInput } from '../../../../shared/schemas/scenario';
import { DEFAULTS } from '@/features/scenario-editor/lib/defaults';
import { faceCorners, hoodAxis, type HoodInput, type Vec3 } from '@/features/scenario-editor/lib/hood-axis';
import type { ViewFrame } from '@/features/scenario-editor/lib/view-frame';
import { arrowPath } from './view-parts';

export type ViewKind = 'plan' | 'elevation';
// Plan looks down (x right, y up); elevation looks toward +y (x right, z up).
export const project = (p: Vec3, view: ViewKind) => (view === 'plan' ? { a: p.x, b: p.y } : { a: p.x, b: p.z });

const ARROW_m = 0.4;
const MIN_SIZE_px = 5;

export function HoodGlyph({ hood, index, frame, view }: { hood: HoodInput; index: number; frame: ViewFrame; view: ViewKind }) {
  const corners = faceCorners(hood).map((c) => project(c, view));
  const points = corners.map((p) => `${frame.toX(p.a)},${frame.toY(p.b)}`).join(' ');
  // Above the face outline, where neither the arrow (in front) nor the duct side (behind) is drawn for a level hood.
  const labelY = Math.min(...corners.map((p) => frame.toY(p.b))) - 9;
  const n = project(hoodAxis(hood.direction), view);
  const towardViewer = view === 'plan' ? hoodAxis(hood.direction).z > 0 : hoodAxis(hood.direction).y < 0;
  const cx = frame.toX(hood.x_m);
  const cy = frame.toY(view === 'plan' ? hood.y_m : hood.z_m);
  const flat = Math.hypot(n.a, n.b) < 0.2;
  return (
    <g>
      <polygon points={points} className="fill-accent-soft stroke-accent-strong" strokeWidth={5} strokeLinejoin="round" />
      {flat ? (
        // Facing straight at or away from the viewer: the usual dot (toward) and cross (away) symbols.
        <g className="stroke-accent-strong" strokeWidth={2} fill="none">
          <circle cx={cx} cy={cy} r={7} className="fill-white" />
          {towardViewer ? (
            <circle cx={cx} cy={cy} r={2} className="fill-accent-strong" />
          ) : (
            <path d={`M${cx - 4},${cy - 4} L${cx + 4},${cy + 4} M${cx - 4},${cy + 4} L${cx + 4},${cy - 4}`} />
          )}
        </g>
      ) : (
        <path
          d={arrowPath(cx, cy, frame.toX(hood.x_m + n.a * ARROW_m), frame.toY((view === 'plan' ? hood.y_m : hood.z_m) + n.b * ARROW_m))}
          className="fill-none stroke-accent-strong"
          strokeWidth={2.5}
          strokeLinecap="round"
        />
      )}
      <text x={cx} y={Math.min(labelY, cy - 12)} textAnchor="middle" className="fill-accent-strong text-[11px] font-semibold">
        H{index + 1}
      </text>
    </g>
  );
}

export function SourceGlyph({ source, frame, view }: { source: ScenarioInput['source']; frame: ViewFrame; view: ViewKind }) {
  const cx = frame.toX(source.x_m);
  const cy = frame.toY(view === 'plan' ? source.y_m : source.z_m);
  const shape = source.shape ?? DEFAULTS.shape;
  const half = Math.max(MIN_SIZE_px, ((source.size_m ?? 0) * frame.scale_pxPerM) / 2);
  return (
    <g className="fill-watch-soft stroke-watch" strokeWidth={2}>
      {shape === 'box' && <rect x={cx - half} y={cy - half} width={half * 2} height={half * 2} />}
      {shape === 'disc' &&
        (view === 'plan' ? <circle cx={cx} cy={cy} r={half} /> : <line x1={cx - half} x2={cx + half} y1={cy} y2={cy} strokeWidth={4} />)}
      <path d={`M${cx},${cy - 7} L${cx + 7},${cy} L${cx},${cy + 7} L${cx - 7},${cy} Z`} className="fill-watch" />
    </g>
  );
}

export function WorkerGlyph({ worker, frame, view }: { worker: ScenarioInput['worker']; frame: ViewFrame; view: ViewKind }) {
  const cx = frame.toX(worker.x_m);
  const cy = frame.toY(view === 'plan' ? worker.y_m : worker.z_m);
  const zone_px = Math.max(MIN_SIZE_px, (worker.radius_m ?? DEFAULTS.radius_m) * frame.scale_pxPerM);
  return (
    <g>
      <circle cx={cx} cy={cy} r={zone_px} className="fill-ink/5 stroke-ink" strokeWidth={1.5} strokeDasharray="5 4" />
      <circle cx={cx} cy={cy} r={6} className="fill-ink stroke-white" strokeWidth={2} />
    </g>
  );
}
