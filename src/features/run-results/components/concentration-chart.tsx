import { readableNumber, trimSig } from '../../../../shared/format/index';
import { AxisBottom, AxisLeft } from '@visx/axis';
import { GridRows } from '@visx/grid';
import { Group } from '@visx/group';
import { scaleLinear } from '@visx/scale';
import { Area, LinePath } from '@visx/shape';
import type { Fraction } from '../../../../shared/vocabulary/fractions';
import { FRACTION_LABEL } from '../../../../shared/vocabulary/index';
import type { RunResult } from '../../../../shared/schemas/run-result';
import { ACCENT, ACCENT_SOFT, ACT, LINE, MUTED, axisLabel, tickLabel } from '@/components/chart-style';

const WIDTH = 760;
const HEIGHT = 340;
const MARGIN = { top: 20, right: 24, bottom: 52, left: 78 };
// A limit far above the curve would flatten it to the axis; past this ratio it is stated in words instead.
const LIMIT_IN_VIEW = 5;

const tick = (v: unknown) => trimSig(Number(v), 3);

export function ConcentrationChart({ view, fraction }: { view: RunResult; fraction: Fraction }) {
  const band = view.breathingZone.series[fraction];
  const points = view.breathingZone.series.time_s
    .map((t, i) => ({ t: t / 60, mean: band.mean[i], lo: band.lo[i], hi: band.hi[i] }))
    .filter((p) => Number.isFinite(p.mean));
  const dataMax = Math.max(1e-12, ...points.map((p) => (Number.isFinite(p.hi) ? p.hi : p.mean)));
  const limit = view.limit?.fraction === fraction ? view.limit.value_mgPerM3 : undefined;
  const showLimit = limit !== undefined && limit <= LIMIT_IN_VIEW * dataMax;
  const yMax = (showLimit ? Math.max(dataMax, limit) : dataMax) * 1.08;
  const tMax = Math.max(...view.breathingZone.series.time_s, 1) / 60;
  const innerW = WIDTH - MARGIN.left - MARGIN.right;
  const innerH = HEIGHT - MARGIN.top - MARGIN.bottom;
  const x = scaleLinear({ domain: [0, tMax], range: [0, innerW] });
  const y = scaleLinear({ domain: [0, yMax], range: [innerH, 0], nice: true });
  const name = FRACTION_LABEL[fraction].toLowerCase();

  return (
    <figure className="rounded-lg border border-line bg-white p-3">
      <figcaption className="mb-2 flex flex-wrap gap-x-5 gap-y-1 text-sm">
        <span className="inline-flex items-center gap-1.5">
          <span aria-hidden="true" className="inline-block h-0.5 w-5 bg-accent" />
          Mean, {name}
        </span>
        <span className="inline-flex items-center gap-1.5">
          <span aria-hidden="true" className="inline-block h-3 w-5 bg-accent-soft outline outline-1 outline-accent/40" />
          95 % confidence band
        </span>
        {showLimit && (
          <span className="inline-flex items-center gap-1.5">
            <span aria-hidden="true" className="inline-block w-5 border-t-2 border-dashed border-act" />
            Limit {readableNumber(limit)} mg/m³
          </span>
        )}
      </figcaption>
      <svg
        viewBox={`0 0 ${WIDTH} ${HEIGHT}`}
        className="h-auto w-full"
        role="img"
        aria-label={`Breathing-zone ${name} concentration over ${readableNumber(tMax)} min, peaking at ${readableNumber(Math.max(...points.map((p) => p.mean)))} mg/m³`}
      >
        <Group left={MARGIN.left} top={MARGIN.top}>
          <GridRows scale={y} width={innerW} numTicks={6} stroke={LINE} strokeOpacity={0.7} />
          <Area
            data={points}
            x={(p) => x(p.t)}
            y0={(p) => y(Number.isFinite(p.lo) ? p.lo : p.mean)}
            y1={(p) => y(Number.isFinite(p.hi) ? p.hi : p.mean)}
            fill={ACCENT_SOFT}
            stroke={ACCENT}
            strokeOpacity={0.25}
            data-testid="ci-band"
          />
          <LinePath data={points} x={(p) => x(p.t)} y={(p) => y(p.mean)} stroke={ACCENT} strokeWidth={2} />
          {showLimit && (
            <line
              x1={0}
              x2={innerW}
              y1={y(limit)}
              y2={y(limit)}
              stroke={ACT}
              strokeWidth={1.5}
              strokeDasharray="7 5"
              data-testid="limit-line"
            />
          )}
          <AxisLeft
            scale={y}
            numTicks={6}
            tickFormat={tick}
            stroke={MUTED}
            tickStroke={MUTED}
            tickLabelProps={() => ({ ...tickLabel, textAnchor: 'end', dx: -4, dy: 4 })}
            label="Concentration (mg/m³)"
            labelProps={{ ...axisLabel, textAnchor: 'middle' }}
            labelOffset={50}
          />
          <AxisBottom
            top={innerH}
            scale={x}
            numTicks={10}
            tickFormat={tick}
            stroke={MUTED}
            tickStroke={MUTED}
            tickLabelProps={() => ({ ...tickLabel, textAnchor: 'middle' })}
            label="Time since the task started (min)"
            labelProps={{ ...axisLabel, textAnchor: 'middle' }}
            labelOffset={16}
          />
        </Group>
      </svg>
      {limit !== undefined && !showLimit && (
        <p className="mt-1 text-sm text-muted">
          The limit, {readableNumber(limit)} mg/m³, is more than {LIMIT_IN_VIEW} times the highest value here and lies above the chart.
        </p>
      )}
      {limit === undefined && view.limit && (
        <p className="mt-1 text-sm text-muted">
          The limit applies to the {FRACTION_LABEL[view.limit.fraction].toLowerCase()} fraction, so no limit line is drawn for this one.
        </p>
      )}
    </figure>
  );
}
