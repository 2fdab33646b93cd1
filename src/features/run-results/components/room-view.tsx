import { useId, type ReactNode } from 'react';
import type { Scenario } from '../../../../shared/schemas/scenario';
import { gridStep_m, hoodOutlines, type Projection } from '@/features/run-results/lib/room-projection';
import { ACT, INK, LINE, MUTED } from '@/components/chart-style';

// Type is sized in drawing units; views shown narrower (side by side) pass a larger textScale so
// labels still come out near 11–13 px on screen.
const tickLabel = (k: number) => ({ fill: MUTED, fontSize: 13 * k, fontFamily: 'inherit' }) as const;
const axisLabel = (k: number) => ({ fill: INK, fontSize: 14 * k, fontWeight: 600, fontFamily: 'inherit' }) as const;

export const DRAWING_WIDTH = 640;
const margins = (k: number) => ({ top: 14 * k, right: 16, bottom: 66 * k, left: 58 * k });

const range = (step: number, max: number) => Array.from({ length: Math.floor(max / step + 1e-9) + 1 }, (_, i) => i * step);

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
}: {
  scenario: Scenario;
  p: Projection;
  label: string;
  under?: ReactNode;
  over?: ReactNode;
  textScale?: number;
}) {
  const M = margins(k);
  const w = p.width_m * p.scale;
  const h = p.height_m * p.scale;
  const step = gridStep_m(Math.max(p.width_m, p.height_m));
  const bar = step * p.scale;
  // Several views share a page; marker ids must be unique and safe inside url(#…).
  const arrow = `arrow-${useId().replace(/[^\w-]/g, '')}`;
  return (
    <svg viewBox={`0 0 ${w + M.left + M.right} ${h + M.top + M.bottom}`} className="h-auto w-full" role="img" aria-label={label}>
      <defs>
        <marker id={arrow} viewBox="0 0 10 10" refX="9" refY="5" markerWidth="6" markerHeight="6" orient="auto-start-reverse">
          <path d="M0 0 L10 5 L0 10 Z" fill={ACT} />
        </marker>
      </defs>
      <g transform={`translate(${M.left} ${M.top})`}>
        <rect width={w} height={h} fill="white" />
        {under}
        {range(step, p.width_m).map((x) => (
          <line key={`x${x}`} x1={x * p.scale} x2={x * p.scale} y1={0} y2={h} stroke={LINE} strokeWidth={0.75} />
        ))}
        {range(step, p.height_m).map((y) => (
          <line key={`y${y}`} x1={0} x2={w} y1={h - y * p.scale} y2={h - y * p.scale} stroke={LINE} strokeWidth={0.75} />
        ))}
        <rect width={w} height={h} fill="none" stroke={INK} strokeWidth={2} />
        {range(step, p.width_m).map((x) => (
          <text key={`tx${x}`} x={x * p.scale} y={h + 14} textAnchor="middle" {...tickLabel(k)}>
            {x}
          </text>
        ))}
        {range(step, p.height_m).map((y) => (
          <text key={`ty${y}`} x={-6} y={h - y * p.scale + 4} textAnchor="end" {...tickLabel(k)}>
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
        <Markers scenario={scenario} p={p} arrow={arrow} k={k} />
        {over}
      </g>
    </svg>
  );
}
