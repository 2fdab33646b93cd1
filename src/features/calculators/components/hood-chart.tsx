import { readableNumber } from '../../../../shared/format/index';
import { GridRows } from '@visx/grid';
import { scaleLinear, scaleLog } from '@visx/scale';
import { LinePath } from '@visx/shape';
import { decadeTicks, plainTick } from '@/features/calculators/lib/chart-ticks';
import { plainNumber } from '@/features/calculators/lib/format';
import type { HoodFigures } from '@/features/calculators/lib/hood-figures';
import { ACCENT, CLEAR_SOFT, INK, LINE, PAPER_DEEP, WATCH, halo } from '@/components/chart-style';
import { ChartFigure, plotSize } from '@/components/charts/chart-figure';
import { LegendKey } from '@/components/charts/legend-key';

const BOX = { width: 760, height: 360, margin: { top: 24, right: 24, bottom: 56, left: 70 } };
const SAMPLES = 160;

// Velocities span decades between face and far field, so the velocity axis is logarithmic; distance stays linear.
export default function HoodChart({ f, distance_m }: { f: HoodFigures; distance_m: number }) {
  const booth = f.geometry.kind === 'booth';
  const xMax = Math.max(distance_m, booth ? 0 : f.validUpTo_m) * 1.35;
  const points = Array.from({ length: SAMPLES + 1 }, (_, i) => (xMax * i) / SAMPLES).map((x) => ({ x, v: f.velocityAt(x) }));
  const velocities = [...points.map((p) => p.v), f.range.min_mPerS, f.range.max_mPerS];
  const yMin = 10 ** Math.floor(Math.log10(Math.min(...velocities)));
  const yMax = 10 ** Math.ceil(Math.log10(Math.max(...velocities)));
  const { innerW, innerH } = plotSize(BOX);
  const x = scaleLinear({ domain: [0, xMax], range: [0, innerW], nice: false });
  const y = scaleLog({ domain: [yMin, yMax], range: [innerH, 0] });
  const yTicks = decadeTicks(yMin, yMax)
    .flatMap((t) => [t, 2 * t, 5 * t])
    .filter((t) => t >= yMin && t <= yMax);

  return (
    <ChartFigure
      box={BOX}
      label={`Centre-line velocity from the face to ${readableNumber(xMax)} m, with the capture range ${f.range.min_mPerS}–${f.range.max_mPerS} m/s shaded`}
      axes={{
        x,
        y,
        left: { label: 'Centre-line velocity (m/s, log scale)', labelOffset: 40, tickValues: yTicks, format: plainTick },
        bottom: { label: 'Distance from the face along the centre line (m)', labelOffset: 18, numTicks: 8, format: plainTick },
      }}
      caption={
        <figcaption className="mb-2 flex flex-wrap gap-x-5 gap-y-1 text-sm">
          <span className="font-semibold">Centre-line velocity against distance</span>
          <LegendKey swatch="h-0.5 w-5 bg-accent">Centre-line velocity</LegendKey>
          <LegendKey swatch="h-3 w-5 bg-clear-soft outline outline-1 outline-clear">Published capture range</LegendKey>
          {!booth && <LegendKey swatch="h-3 w-5 bg-paper-deep">Beyond the equation&apos;s range</LegendKey>}
        </figcaption>
      }
    >
      {!booth && f.validUpTo_m < xMax && (
        <rect x={x(f.validUpTo_m)} width={innerW - x(f.validUpTo_m)} y={0} height={innerH} fill={PAPER_DEEP} />
      )}
      <rect
        x={0}
        width={innerW}
        y={y(f.range.max_mPerS)}
        height={y(f.range.min_mPerS) - y(f.range.max_mPerS)}
        fill={CLEAR_SOFT}
        fillOpacity={0.85}
        data-testid="capture-band"
      />
      <GridRows scale={y} width={innerW} tickValues={yTicks} stroke={LINE} strokeOpacity={0.7} />
      <LinePath data={points} x={(p) => x(p.x)} y={(p) => y(p.v)} stroke={ACCENT} strokeWidth={2.5} />
      {!booth && f.validUpTo_m < xMax && (
        <g data-testid="validity-marker">
          <line x1={x(f.validUpTo_m)} x2={x(f.validUpTo_m)} y1={0} y2={innerH} stroke={WATCH} strokeWidth={1.5} strokeDasharray="6 4" />
          <text x={x(f.validUpTo_m) + 6} y={14} fill={WATCH} fontSize={12} fontWeight={600}>
            1.5 hood diameters: {readableNumber(f.validUpTo_m)} m
          </text>
        </g>
      )}
      <line x1={x(distance_m)} x2={x(distance_m)} y1={y(f.centerline_mPerS)} y2={innerH} stroke={INK} strokeDasharray="2 3" />
      <circle cx={x(distance_m)} cy={y(f.centerline_mPerS)} r={5} fill="white" stroke={INK} strokeWidth={2} />
      <text x={x(distance_m) + 8} y={y(f.centerline_mPerS) - 10} fill={INK} fontSize={12} fontWeight={600} {...halo}>
        {readableNumber(f.centerline_mPerS)} m/s at {plainNumber(distance_m)} m
      </text>
    </ChartFigure>
  );
}
