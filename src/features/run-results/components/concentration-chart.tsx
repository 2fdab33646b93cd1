import { countText, readableNumber, trimSig } from '../../../../shared/format/index';
import { MIN_VISITS_PER_BIN } from '../../../../workers/engine/series-bins';
import { GridRows } from '@visx/grid';
import { scaleLinear } from '@visx/scale';
import { Area, LinePath } from '@visx/shape';
import type { Fraction } from '../../../../shared/vocabulary/fractions';
import { FRACTION_LABEL } from '../../../../shared/vocabulary/index';
import type { RunResult } from '../../../../shared/schemas/run-result';
import { ACCENT, ACCENT_SOFT, LINE } from '@/components/chart-style';
import { ChartFigure, plotSize } from '@/components/charts/chart-figure';
import { LegendKey } from '@/components/charts/legend-key';
import { ReferenceLine } from '@/components/charts/reference-line';

const BOX = { width: 760, height: 340, margin: { top: 20, right: 24, bottom: 52, left: 78 } };
// A limit far above the curve would flatten it to the axis; past this ratio it is stated in words instead.
const LIMIT_IN_VIEW = 5;

const tick = (v: number) => trimSig(v, 3);

// The bin width and what it holds; a series too thin to read says so instead of letting its spikes pass for data.
function SeriesNote({ view, fraction }: { view: RunResult; fraction: Fraction }) {
  const series = view.breathingZone.series;
  const band = series[fraction];
  const width_min = (series.binWidth_s ?? (series.time_s[1] ?? 0) - (series.time_s[0] ?? 0)) / 60;
  const visits = band.visits?.reduce((a, v) => a + v, 0);
  if (band.sparse && visits === 0)
    return (
      <p
        role="status"
        data-testid="series-sparse"
        className="mt-2 rounded-md border-2 border-watch bg-watch-soft p-2 text-sm font-semibold text-watch"
      >
        No simulated dust of this fraction reached the breathing zone, so there is no series to draw. Read the 8-h TWA and the
        verdict&apos;s reasons, or run more particles.
      </p>
    );
  if (band.sparse)
    return (
      <p
        role="status"
        data-testid="series-sparse"
        className="mt-2 rounded-md border-2 border-watch bg-watch-soft p-2 text-sm font-semibold text-watch"
      >
        Too sparse to read: about {countText(visits ?? 0)} zone visits in all, fewer than {MIN_VISITS_PER_BIN} in some{' '}
        {readableNumber(width_min, 2)}-min bins where the dust is, so the ups and downs are noise. Read the 8-h TWA and its interval, which
        pool every visit, or run more particles.
      </p>
    );
  return (
    <p className="mt-1 text-sm text-muted" data-testid="series-bins">
      Each point averages {readableNumber(width_min, 2)} min
      {visits !== undefined
        ? `, a width chosen so each bin where the dust is holds at least ${MIN_VISITS_PER_BIN} zone visits (${countText(visits)} in all)`
        : ''}
      .
    </p>
  );
}

export function ConcentrationChart({ view, fraction }: { view: RunResult; fraction: Fraction }) {
  const band = view.breathingZone.series[fraction];
  // Not one zone visit: an empty plot would only draw a flat line on a made-up scale, so the note stands alone.
  if (band.sparse && band.visits?.reduce((a, v) => a + v, 0) === 0) return <SeriesNote view={view} fraction={fraction} />;
  const points = view.breathingZone.series.time_s
    .map((t, i) => ({ t: t / 60, mean: band.mean[i], lo: band.lo[i], hi: band.hi[i] }))
    .filter((p) => Number.isFinite(p.mean));
  const dataMax = Math.max(1e-12, ...points.map((p) => (Number.isFinite(p.hi) ? p.hi : p.mean)));
  const limit = view.limit?.fraction === fraction ? view.limit.value_mgPerM3 : undefined;
  const showLimit = limit !== undefined && limit <= LIMIT_IN_VIEW * dataMax;
  const yMax = (showLimit ? Math.max(dataMax, limit) : dataMax) * 1.08;
  const tMax = Math.max(...view.breathingZone.series.time_s, 1) / 60;
  const { innerW, innerH } = plotSize(BOX);
  const x = scaleLinear({ domain: [0, tMax], range: [0, innerW] });
  const y = scaleLinear({ domain: [0, yMax], range: [innerH, 0], nice: true });
  const name = FRACTION_LABEL[fraction].toLowerCase();

  return (
    <ChartFigure
      box={BOX}
      caption={
        <figcaption className="mb-2 flex flex-wrap gap-x-5 gap-y-1 text-sm">
          <LegendKey swatch="h-0.5 w-5 bg-accent">Mean, {name}</LegendKey>
          <LegendKey swatch="h-3 w-5 bg-accent-soft outline outline-1 outline-accent/40">95 % confidence band</LegendKey>
          {showLimit && <LegendKey swatch="w-5 border-t-2 border-dashed border-act">Limit {readableNumber(limit)} mg/m³</LegendKey>}
        </figcaption>
      }
      label={`Breathing-zone ${name} concentration over ${readableNumber(tMax)} min, peaking at ${readableNumber(Math.max(...points.map((p) => p.mean)))} mg/m³`}
      axes={{
        x,
        y,
        left: { label: 'Concentration (mg/m³)', labelOffset: 50, numTicks: 6, format: tick },
        bottom: { label: 'Time since the task started (min)', labelOffset: 16, numTicks: 10, format: tick },
      }}
      footer={
        <>
          <SeriesNote view={view} fraction={fraction} />
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
        </>
      }
    >
      <GridRows scale={y} width={innerW} numTicks={6} stroke={LINE} strokeOpacity={0.7} />
      <Area
        data={points}
        x={(p) => x(p.t)}
        y0={(p) => y(Number.isFinite(p.lo) ? p.lo : p.mean)}
        y1={(p) => y(Number.isFinite(p.hi) ? p.hi : p.mean)}
        fill={ACCENT_SOFT}
        fillOpacity={band.sparse ? 0.5 : 1}
        stroke={ACCENT}
        strokeOpacity={0.25}
        data-testid="ci-band"
      />
      <LinePath
        data={points}
        x={(p) => x(p.t)}
        y={(p) => y(p.mean)}
        stroke={ACCENT}
        strokeWidth={2}
        strokeDasharray={band.sparse ? '4 4' : undefined}
      />
      {showLimit && <ReferenceLine y={y(limit)} width={innerW} testId="limit-line" />}
    </ChartFigure>
  );
}
