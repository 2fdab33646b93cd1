import { AxisBottom, AxisLeft } from '@visx/axis';
import { GridRows } from '@visx/grid';
import { Group } from '@visx/group';
import { scaleLinear, scaleLog } from '@visx/scale';
import { Area, LinePath } from '@visx/shape';
import { sig } from '@/lib/format';
import { PARAMETER } from '@/features/sweep/lib/parameter-format';
import type { SweepParameter } from '@/features/sweep/lib/sweep-points';

export interface ChartPoint {
  value: number;
  percent: number;
  lower: number;
  upper: number;
}

const WIDTH = 760;
const HEIGHT = 340;
const MARGIN = { top: 20, right: 24, bottom: 52, left: 78 };
const INK = 'var(--color-ink)';
const MUTED = 'var(--color-muted)';
const LINE = 'var(--color-line)';
const ACCENT = 'var(--color-accent)';
const ACCENT_SOFT = 'var(--color-accent-soft)';
const ACT = 'var(--color-act)';
const tickLabel = { fill: MUTED, fontSize: 11, fontFamily: 'inherit' } as const;
const axisLabel = { fill: INK, fontSize: 12, fontWeight: 600, fontFamily: 'inherit' } as const;
// A linear axis flattens a curve that falls a hundredfold; past one decade the y axis goes logarithmic.
const LOG_ABOVE_RATIO = 10;

const tick = (v: unknown) => sig(Number(v), 3);
// Labelling every log tick crowds the axis; 1, 2 and 5 per decade are enough to read it.
const logTick = (v: unknown) => ([1, 2, 5].includes(Number(Number(v).toExponential(0).split('e')[0])) ? tick(v) : '');

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
  const innerW = WIDTH - MARGIN.left - MARGIN.right;
  const innerH = HEIGHT - MARGIN.top - MARGIN.bottom;
  const x = scaleLinear({ domain: [Math.min(...data.map((d) => d.x)), Math.max(...data.map((d) => d.x))], range: [0, innerW] });
  const y = log
    ? scaleLog({ domain: [bottom, top], range: [innerH, 0] })
    : scaleLinear({ domain: [0, top], range: [innerH, 0], nice: true });
  // A zero lower bound has no place on a log axis; it is drawn at the axis floor.
  const yOf = (v: number) => y(log ? Math.max(v, bottom) : v) ?? 0;

  return (
    <figure className="rounded-lg border border-line bg-white p-3 print:break-inside-avoid">
      <figcaption className="mb-2 flex flex-wrap gap-x-5 gap-y-1 text-sm">
        <span className="inline-flex items-center gap-1.5">
          <span aria-hidden="true" className="inline-block h-0.5 w-5 bg-accent" />
          8-h TWA as % of the limit
        </span>
        <span className="inline-flex items-center gap-1.5">
          <span aria-hidden="true" className="inline-block h-3 w-5 bg-accent-soft outline outline-1 outline-accent/40" />
          95 % confidence band
        </span>
        <span className="inline-flex items-center gap-1.5">
          <span aria-hidden="true" className="inline-block w-5 border-t-2 border-dashed border-act" />
          Target {sig(targetPercent, 3)} % of the limit
        </span>
        {log && <span className="text-muted">Logarithmic % axis: the values span more than a decade.</span>}
      </figcaption>
      <svg
        viewBox={`0 0 ${WIDTH} ${HEIGHT}`}
        className="h-auto w-full"
        role="img"
        aria-label={`Exposure as % of the limit against ${p.label.toLowerCase()}`}
        data-testid="sweep-chart"
      >
        <Group left={MARGIN.left} top={MARGIN.top}>
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
          <line
            x1={0}
            x2={innerW}
            y1={yOf(targetPercent)}
            y2={yOf(targetPercent)}
            stroke={ACT}
            strokeWidth={1.5}
            strokeDasharray="7 5"
            data-testid="target-line"
          />
          <AxisLeft
            scale={y}
            numTicks={6}
            tickFormat={log ? logTick : tick}
            stroke={MUTED}
            tickStroke={MUTED}
            tickLabelProps={() => ({ ...tickLabel, textAnchor: 'end', dx: -4, dy: 4 })}
            label="8-h TWA (% of the limit)"
            labelProps={{ ...axisLabel, textAnchor: 'middle' }}
            labelOffset={50}
          />
          <AxisBottom
            top={innerH}
            scale={x}
            numTicks={Math.min(10, data.length + 2)}
            tickFormat={tick}
            stroke={MUTED}
            tickStroke={MUTED}
            tickLabelProps={() => ({ ...tickLabel, textAnchor: 'middle' })}
            label={p.axis}
            labelProps={{ ...axisLabel, textAnchor: 'middle' }}
            labelOffset={16}
          />
        </Group>
      </svg>
    </figure>
  );
}
