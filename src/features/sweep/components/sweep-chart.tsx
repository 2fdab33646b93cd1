import { GridRows } from '@visx/grid';
import { scaleLinear, scaleLog } from '@visx/scale';
import { Area, LinePath } from '@visx/shape';
import { sig } from '@/lib/format';
import { PARAMETER } from '@/features/sweep/lib/parameter-format';
import type { SweepParameter } from '@/features/sweep/lib/sweep-points';
import { ACCENT, ACCENT_SOFT, LINE } from '@/components/chart-style';
import { ChartFigure, plotSize } from '@/components/charts/chart-figure';
import { LegendKey } from '@/components/charts/legend-key';
import { ReferenceLine } from '@/components/charts/reference-line';

export interface ChartPoint {
  value: number;
  percent: number;
  lower: number;
  upper: number;
}

const BOX = { width: 760, height: 340, margin: { top: 20, right: 24, bottom: 52, left: 78 } };
// A linear axis flattens a curve that falls a hundredfold; past one decade the y axis goes logarithmic.
const LOG_ABOVE_RATIO = 10;

const tick = (v: number) => sig(v, 3);
// Labelling every log tick crowds the axis; 1, 2 and 5 per decade are enough to read it.
const logTick = (v: number) => ([1, 2, 5].includes(Number(v.toExponential(0).split('e')[0])) ? tick(v) : '');

export function SweepChart({
  points,
  parameter,
  targetPercent,
}: {
  points: ChartPoint[];
  parameter: SweepParameter;
  targetPercent: number;
}) {
  const p = PARAMETER[parameter];
  const data = [...points].sort((a, b) => a.value - b.value).map((d) => ({ ...d, x: p.fromSi(d.value) }));
  const positive = data.flatMap((d) => [d.percent, d.upper, d.lower]).filter((v) => v > 0);
  const top = Math.max(targetPercent, ...positive, 1e-6) * 1.1;
  const bottom = Math.min(targetPercent, ...positive) / 1.5;
  const log = top / bottom > LOG_ABOVE_RATIO;
  const { innerW, innerH } = plotSize(BOX);
  const x = scaleLinear({ domain: [Math.min(...data.map((d) => d.x)), Math.max(...data.map((d) => d.x))], range: [0, innerW] });
  const y = log
    ? scaleLog({ domain: [bottom, top], range: [innerH, 0] })
    : scaleLinear({ domain: [0, top], range: [innerH, 0], nice: true });
  // A zero lower bound has no place on a log axis; it is drawn at the axis floor.
  const yOf = (v: number) => y(log ? Math.max(v, bottom) : v) ?? 0;

  return (
    <ChartFigure
      box={BOX}
      unbroken
      testId="sweep-chart"
      caption={
        <figcaption className="mb-2 flex flex-wrap gap-x-5 gap-y-1 text-sm">
          <LegendKey swatch="h-0.5 w-5 bg-accent">8-h TWA as % of the limit</LegendKey>
          <LegendKey swatch="h-3 w-5 bg-accent-soft outline outline-1 outline-accent/40">95 % confidence band</LegendKey>
          <LegendKey swatch="w-5 border-t-2 border-dashed border-act">Target {sig(targetPercent, 3)} % of the limit</LegendKey>
          {log && <span className="text-muted">Logarithmic % axis: the values span more than a decade.</span>}
        </figcaption>
      }
      label={`Exposure as % of the limit against ${p.label.toLowerCase()}`}
      axes={{
        x,
        y,
        left: { label: '8-h TWA (% of the limit)', labelOffset: 50, numTicks: 6, format: log ? logTick : tick },
        bottom: { label: p.axis, labelOffset: 16, numTicks: Math.min(10, data.length + 2), format: tick },
      }}
    >
      <GridRows scale={y} width={innerW} numTicks={6} stroke={LINE} strokeOpacity={0.7} />
      <Area
        data={data}
        x={(d) => x(d.x)}
        y0={(d) => yOf(d.lower)}
        y1={(d) => yOf(d.upper)}
        fill={ACCENT_SOFT}
        stroke={ACCENT}
        strokeOpacity={0.25}
        data-testid="sweep-band"
      />
      <LinePath data={data} x={(d) => x(d.x)} y={(d) => yOf(d.percent)} stroke={ACCENT} strokeWidth={2} />
      {data.map((d) => (
        <circle key={d.value} cx={x(d.x)} cy={yOf(d.percent)} r={4} fill={ACCENT} />
      ))}
      <ReferenceLine y={yOf(targetPercent)} width={innerW} testId="target-line" />
    </ChartFigure>
  );
}
