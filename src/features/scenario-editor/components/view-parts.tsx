import type { ViewFrame } from '@/features/scenario-editor/lib/view-frame';
import { gridSpacing_m, stepsWithin } from '@/lib/view-zoom';

// Labelled lines where they stay readable, unlabelled finer lines where the zoom leaves room for them.
export function gridSteps(frame: ViewFrame) {
  const major = gridSpacing_m(frame.scale_pxPerM, 60);
  const minor = gridSpacing_m(frame.scale_pxPerM, 14);
  return { major, minor: minor < major ? minor : undefined };
}

export function RoomGrid({ frame, labelA, labelB, clipId }: { frame: ViewFrame; labelA: string; labelB: string; clipId: string }) {
  const { a, b } = frame.span_m;
  const w = frame.window;
  const { plot } = frame;
  const { major, minor } = gridSteps(frame);
  const zoomed = w.a1_m - w.a0_m < a - 1e-9;
  return (
    <g aria-hidden="true">
      <rect x={plot.x0} y={plot.y1} width={plot.x1 - plot.x0} height={plot.y0 - plot.y1} className="fill-paper" />
      <g clipPath={`url(#${clipId})`}>
        {minor &&
          stepsWithin(w.a0_m, w.a1_m, minor).map((v) => (
            <line key={`ma${v}`} x1={frame.toX(v)} x2={frame.toX(v)} y1={plot.y0} y2={plot.y1} className="stroke-paper-deep" />
          ))}
        {minor &&
          stepsWithin(w.b0_m, w.b1_m, minor).map((v) => (
            <line key={`mb${v}`} x1={plot.x0} x2={plot.x1} y1={frame.toY(v)} y2={frame.toY(v)} className="stroke-paper-deep" />
          ))}
        {stepsWithin(w.a0_m, w.a1_m, major).map((v) => (
          <line key={`a${v}`} x1={frame.toX(v)} x2={frame.toX(v)} y1={plot.y0} y2={plot.y1} className="stroke-line" />
        ))}
        {stepsWithin(w.b0_m, w.b1_m, major).map((v) => (
          <line key={`b${v}`} x1={plot.x0} x2={plot.x1} y1={frame.toY(v)} y2={frame.toY(v)} className="stroke-line" />
        ))}
        <rect
          x={frame.toX(0)}
          y={frame.toY(b)}
          width={frame.toX(a) - frame.toX(0)}
          height={frame.toY(0) - frame.toY(b)}
          className="fill-none stroke-ink"
          strokeWidth={zoomed ? 5 : 2}
        />
      </g>
      {zoomed && (
        <rect
          x={plot.x0}
          y={plot.y1}
          width={plot.x1 - plot.x0}
          height={plot.y0 - plot.y1}
          className="fill-none stroke-line"
          strokeWidth={1}
        />
      )}
      {stepsWithin(w.a0_m, w.a1_m, major).map((v) => (
        <text key={`ta${v}`} x={frame.toX(v)} y={plot.y0 + 16} textAnchor="middle" className="fill-muted text-[11px]">
          {v}
        </text>
      ))}
      {stepsWithin(w.b0_m, w.b1_m, major).map((v) => (
        <text key={`tb${v}`} x={plot.x0 - 8} y={frame.toY(v) + 4} textAnchor="end" className="fill-muted text-[11px]">
          {v}
        </text>
      ))}
      <text x={plot.x1 + 6} y={plot.y0 + 16} className="fill-ink text-[12px] font-semibold">
        {labelA} →
      </text>
      <text x={plot.x0 - 8} y={plot.y1 - 12} textAnchor="middle" className="fill-ink text-[12px] font-semibold">
        ↑ {labelB}
      </text>
    </g>
  );
}

export function ScaleBar({ frame }: { frame: ViewFrame }) {
  const { major } = gridSteps(frame);
  const x1 = frame.plot.x1;
  const x0 = x1 - major * frame.scale_pxPerM;
  const y = frame.height - 12;
  return (
    <g aria-hidden="true" className="stroke-ink" data-testid="editor-scale-bar">
      <line x1={x0} x2={x1} y1={y} y2={y} strokeWidth={2} />
      <line x1={x0} x2={x0} y1={y - 5} y2={y + 1} strokeWidth={2} />
      <line x1={x1} x2={x1} y1={y - 5} y2={y + 1} strokeWidth={2} />
      <text x={x0 - 6} y={y + 4} textAnchor="end" className="fill-ink stroke-none text-[11px]">
        {major} m
      </text>
    </g>
  );
}

export function arrowPath(x1: number, y1: number, x2: number, y2: number, head = 7): string {
  const angle = Math.atan2(y2 - y1, x2 - x1);
  const left = [x2 - head * Math.cos(angle - 0.45), y2 - head * Math.sin(angle - 0.45)];
  const right = [x2 - head * Math.cos(angle + 0.45), y2 - head * Math.sin(angle + 0.45)];
  return `M${x1},${y1} L${x2},${y2} M${left[0]},${left[1]} L${x2},${y2} L${right[0]},${right[1]}`;
}
