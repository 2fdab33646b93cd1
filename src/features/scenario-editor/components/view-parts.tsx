import type { ViewFrame } from '@/features/scenario-editor/lib/view-frame';

const range = (n: number) => Array.from({ length: Math.floor(n + 1e-9) + 1 }, (_, i) => i);

// Metre grid with labelled ticks; half-metre lines only where the scale leaves room to see them.
export function RoomGrid({ frame, labelA, labelB }: { frame: ViewFrame; labelA: string; labelB: string }) {
  const { a, b } = frame.span_m;
  const x0 = frame.toX(0);
  const x1 = frame.toX(a);
  const y0 = frame.toY(0);
  const y1 = frame.toY(b);
  const halves = frame.scale_pxPerM > 60;
  return (
    <g aria-hidden="true">
      <rect x={x0} y={y1} width={x1 - x0} height={y0 - y1} className="fill-paper" />
      {halves &&
        range(a * 2).map((i) => (
          <line key={`ha${i}`} x1={frame.toX(i / 2)} x2={frame.toX(i / 2)} y1={y0} y2={y1} className="stroke-paper-deep" />
        ))}
      {halves &&
        range(b * 2).map((i) => (
          <line key={`hb${i}`} x1={x0} x2={x1} y1={frame.toY(i / 2)} y2={frame.toY(i / 2)} className="stroke-paper-deep" />
        ))}
      {range(a).map((i) => (
        <g key={`a${i}`}>
          <line x1={frame.toX(i)} x2={frame.toX(i)} y1={y0} y2={y1} className="stroke-line" />
          <text x={frame.toX(i)} y={y0 + 16} textAnchor="middle" className="fill-muted text-[11px]">
            {i}
          </text>
        </g>
      ))}
      {range(b).map((i) => (
        <g key={`b${i}`}>
          <line x1={x0} x2={x1} y1={frame.toY(i)} y2={frame.toY(i)} className="stroke-line" />
          <text x={x0 - 8} y={frame.toY(i) + 4} textAnchor="end" className="fill-muted text-[11px]">
            {i}
          </text>
        </g>
      ))}
      <rect x={x0} y={y1} width={x1 - x0} height={y0 - y1} className="fill-none stroke-ink" strokeWidth={2} />
      <text x={x1 + 6} y={y0 + 16} className="fill-ink text-[12px] font-semibold">
        {labelA} →
      </text>
      <text x={x0 - 8} y={y1 - 12} textAnchor="middle" className="fill-ink text-[12px] font-semibold">
        ↑ {labelB}
      </text>
    </g>
  );
}

export function ScaleBar({ frame }: { frame: ViewFrame }) {
  const x1 = frame.toX(frame.span_m.a);
  const x0 = x1 - frame.scale_pxPerM;
  const y = frame.height - 12;
  return (
    <g aria-hidden="true" className="stroke-ink">
      <line x1={x0} x2={x1} y1={y} y2={y} strokeWidth={2} />
      <line x1={x0} x2={x0} y1={y - 5} y2={y + 1} strokeWidth={2} />
      <line x1={x1} x2={x1} y1={y - 5} y2={y + 1} strokeWidth={2} />
      <text x={x0 - 6} y={y + 4} textAnchor="end" className="fill-ink stroke-none text-[11px]">
        1 m
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
