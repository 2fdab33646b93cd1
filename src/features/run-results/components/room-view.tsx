import { useId, useRef, type ReactNode } from 'react';
import { trimSig } from '../../../../shared/format/index';
import type { Scenario } from '../../../../shared/schemas/scenario';
import { hoodOutlines, type Projection } from '@/features/run-results/lib/room-projection';
import { ACT, INK, LINE, MUTED } from '@/components/chart-style';
import { ZoomControls } from '@/components/zoom-controls';
import type { ViewZoom } from '@/hooks/use-view-zoom';
import { useZoomGestures } from '@/hooks/use-zoom-gestures';
import { gridSpacing_m, stepsWithin } from '@/lib/view-zoom';

// Type is sized in drawing units; views shown narrower (side by side) pass a larger textScale so
// labels still come out near 11–13 px on screen.
const tickLabel = (k: number) => ({ fill: MUTED, fontSize: 13 * k, fontFamily: 'inherit' }) as const;
const axisLabel = (k: number) => ({ fill: INK, fontSize: 14 * k, fontWeight: 600, fontFamily: 'inherit' }) as const;

export const DRAWING_WIDTH = 640;
const margins = (k: number) => ({ top: 14 * k, right: 16, bottom: 66 * k, left: 58 * k });

function Markers({ scenario, p, arrow, k }: { scenario: Scenario; p: Projection; arrow: string; k: number }) {
  const [sx, sy] = p.toSvg(scenario.source.x_m, scenario.source.y_m, scenario.source.z_m);
  const [wx, wy] = p.toSvg(scenario.worker.x_m, scenario.worker.y_m, scenario.worker.z_m);
  return (
    <g>
      <circle
        cx={wx}
        cy={wy}
        r={scenario.worker.radius_m * p.scale}
        fill="none"
        stroke={INK}
        strokeWidth={1.5}
        strokeDasharray="5 3"
        data-testid="breathing-zone"
      />
      <text x={wx} y={wy - scenario.worker.radius_m * p.scale - 5} textAnchor="middle" fontSize={12 * k} fill={INK}>
        breathing zone
      </text>
      {hoodOutlines(scenario.hoods).map((h) => {
        const pts = h.corners.map((c) => p.toSvg(...c));
        const [cx, cy] = p.toSvg(...h.centre);
        // Air moves into the face, so the arrow starts 0.3 m out and points back at the face.
        const [ax, ay] = p.toSvg(h.centre[0] + 0.3 * h.normal[0], h.centre[1] + 0.3 * h.normal[1], h.centre[2] + 0.3 * h.normal[2]);
        return (
          <g key={h.name} data-testid="hood-face">
            <polygon
              points={pts.map((q) => q.join(',')).join(' ')}
              fill={ACT}
              fillOpacity={0.15}
              stroke={ACT}
              strokeWidth={3}
              strokeLinejoin="round"
            />
            {Math.hypot(ax - cx, ay - cy) > 4 && (
              <line x1={ax} y1={ay} x2={cx} y2={cy} stroke={ACT} strokeWidth={1.5} markerEnd={`url(#${arrow})`} />
            )}
            <text x={cx} y={Math.max(...pts.map((q) => q[1])) + 14 * k} textAnchor="middle" fontSize={12 * k} fontWeight={600} fill={ACT}>
              {h.name}
            </text>
          </g>
        );
      })}
      <g transform={`translate(${sx} ${sy})`} data-testid="source-marker">
        <path d="M0 -7 L7 0 L0 7 L-7 0 Z" fill="white" stroke={INK} strokeWidth={2} />
        <circle r={1.8} fill={INK} />
      </g>
    </g>
  );
}

/** One to-scale view of the room: grid, outline, markers; callers add layers below (maps) or above (dots). */
export function RoomView({
  scenario,
  p,
  label,
  under,
  over,
  textScale: k = 1,
  zoom,
  what,
}: {
  scenario: Scenario;
  p: Projection;
  label: string;
  under?: ReactNode;
  over?: ReactNode;
  textScale?: number;
  zoom: ViewZoom;
  /** Names the drawing in the zoom buttons' labels. */
  what: string;
}) {
  const M = margins(k);
  const w = p.plotWidth;
  const h = p.plotHeight;
  const win = p.window;
  const step = gridSpacing_m(p.scale, Math.max(w, h) / 12);
  const bar = step * p.scale;
  const svgRef = useRef<SVGSVGElement>(null);
  const gestures = useZoomGestures(svgRef, zoom, p.scale, (x, y) => p.fromSvg(x - M.left, y - M.top));
  // Several views share a page; marker and clip ids must be unique and safe inside url(#…).
  const uid = useId().replace(/[^\w-]/g, '');
  const arrow = `arrow-${uid}`;
  const clip = `clip-${uid}`;
  const [rx0, ry0] = p.toSvg(0, p.height_m, p.height_m);
  const [rx1, ry1] = p.toSvg(p.width_m, 0, 0);
  const zoomed = zoom.zoom.k > 1.0001;
  return (
    <div className="grid gap-2">
      <ZoomControls v={zoom} what={what} />
      <svg
        ref={svgRef}
        viewBox={`0 0 ${w + M.left + M.right} ${h + M.top + M.bottom}`}
        className={`h-auto w-full rounded-sm focus-visible:outline-3 focus-visible:outline-accent ${zoomed ? 'cursor-move' : ''}`}
        style={{ touchAction: 'pan-y' }}
        role="group"
        tabIndex={0}
        onKeyDown={gestures.onKeyDown}
        aria-label={`${zoomed ? `${label}; zoomed ${trimSig(zoom.zoom.k, 2)}× on x ${trimSig(win.a0_m, 3)}–${trimSig(win.a1_m, 3)} m` : label}. Plus and minus keys zoom, arrow keys pan.`}
        data-zoom={trimSig(zoom.zoom.k, 3)}
        {...gestures.svg}
      >
        <defs>
          <marker id={arrow} viewBox="0 0 10 10" refX="9" refY="5" markerWidth="6" markerHeight="6" orient="auto-start-reverse">
            <path d="M0 0 L10 5 L0 10 Z" fill={ACT} />
          </marker>
          <clipPath id={clip}>
            <rect width={w} height={h} />
          </clipPath>
        </defs>
        <g transform={`translate(${M.left} ${M.top})`}>
          <g clipPath={`url(#${clip})`}>
            <rect width={w} height={h} fill="white" />
            {under}
            {stepsWithin(win.a0_m, win.a1_m, step).map((x) => {
              const [sx] = p.toSvg(x, 0, 0);
              return <line key={`x${x}`} x1={sx} x2={sx} y1={0} y2={h} stroke={LINE} strokeWidth={0.75} />;
            })}
            {stepsWithin(win.b0_m, win.b1_m, step).map((y) => {
              const [, sy] = p.toSvg(0, y, y);
              return <line key={`y${y}`} x1={0} x2={w} y1={sy} y2={sy} stroke={LINE} strokeWidth={0.75} />;
            })}
            <rect x={rx0} y={ry0} width={rx1 - rx0} height={ry1 - ry0} fill="none" stroke={INK} strokeWidth={zoomed ? 4 : 2} />
            <Markers scenario={scenario} p={p} arrow={arrow} k={k} />
            {over}
          </g>
          <rect width={w} height={h} fill="none" stroke={zoomed ? LINE : INK} strokeWidth={zoomed ? 1 : 2} />
          {stepsWithin(win.a0_m, win.a1_m, step).map((x) => (
            <text key={`tx${x}`} x={p.toSvg(x, 0, 0)[0]} y={h + 14} textAnchor="middle" {...tickLabel(k)}>
              {x}
            </text>
          ))}
          {stepsWithin(win.b0_m, win.b1_m, step).map((y) => (
            <text key={`ty${y}`} x={-6} y={p.toSvg(0, y, y)[1] + 4} textAnchor="end" {...tickLabel(k)}>
              {y}
            </text>
          ))}
          <text x={w / 2} y={h + 36 * k} textAnchor="middle" {...axisLabel(k)}>
            {p.horizontalLabel}
          </text>
          <text transform={`translate(${-38 * k} ${h / 2}) rotate(-90)`} textAnchor="middle" {...axisLabel(k)}>
            {p.verticalLabel}
          </text>
          <g transform={`translate(${w - bar} ${h + 48 * k})`} data-testid="scale-bar">
            <rect width={bar} height={5 * k} fill={INK} />
            <rect width={bar / 2} height={5 * k} fill="white" stroke={INK} />
            <text x={-6} y={5 * k + 1} textAnchor="end" fontSize={13 * k} fill={INK}>
              {step} m
            </text>
          </g>
        </g>
      </svg>
    </div>
  );
}
