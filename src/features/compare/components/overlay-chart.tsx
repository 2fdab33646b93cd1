import { FRACTION_LABEL } from '../../../../shared/vocabulary/index';
import { GridRows } from '@visx/grid';
import { scaleLinear, scaleLog } from '@visx/scale';
import { Area, LinePath } from '@visx/shape';
import { useState } from 'react';
import type { Fraction } from '../../../../shared/vocabulary/fractions';
import { plain } from '@/features/compare/lib/labels';
import { type CompareColumn } from '@/features/compare/lib/types';
import { LINE } from '@/components/chart-style';
import { ChartFigure, plotSize } from '@/components/charts/chart-figure';
import { LegendKey } from '@/components/charts/legend-key';
import { ReferenceLine } from '@/components/charts/reference-line';
import { chartSeries, limitsFor, SERIES_LOOK } from './chart-series';

const BOX = { width: 900, height: 380, margin: { top: 16, right: 24, bottom: 52, left: 84 } };
const { innerW: INNER_W, innerH: INNER_H } = plotSize(BOX);
// A log axis needs a floor; four decades below the top keeps a near-zero hood curve visible without flattening the rest.
const LOG_DECADES = 4;

export function OverlayChart({ columns, fraction }: { columns: CompareColumn[]; fraction: Fraction }) {
  const series = chartSeries(columns, fraction);
  const limits = limitsFor(columns, fraction);
  const peaks = series.map((s) => Math.max(0, ...s.points.map((p) => p.hi)));
  const dataMax = Math.max(1e-12, ...peaks, ...limits.map((l) => l.value_mgPerM3));
  const spread = Math.max(...peaks) / Math.max(1e-12, Math.min(...peaks.filter((p) => p > 0)));
  // Options an order of magnitude apart would lie flat on a linear axis, so the default follows the data.
  const [logChoice, setLog] = useState<boolean | null>(null);
  const log = logChoice ?? spread > 10;
  // Whole decades, so the log axis starts and ends on a labelled tick.
  const top = 10 ** Math.ceil(Math.log10(dataMax * 1.05));
  const floor = top / 10 ** LOG_DECADES;
  const y = log
    ? scaleLog({ domain: [floor, top], range: [INNER_H, 0], clamp: true })
    : scaleLinear({ domain: [0, dataMax * 1.08], range: [INNER_H, 0], nice: true });
  const yOf = (v: number) => y(log ? Math.max(v, floor) : v) ?? 0;
  const tMax = Math.max(1, ...series.flatMap((s) => s.points.map((p) => p.t_min)));
  const x = scaleLinear({ domain: [0, tMax], range: [0, INNER_W] });
  const word = FRACTION_LABEL[fraction].toLowerCase();

  if (series.length === 0) return <p className="text-sm text-muted">None of the chosen scenarios has a saved run to draw.</p>;
  return (
    <ChartFigure
      box={BOX}
      caption={
        <figcaption className="mb-2 flex flex-wrap items-center gap-x-5 gap-y-1 text-sm">
          {series.map((s) => {
            const look = SERIES_LOOK[columns.findIndex((c) => c.id === s.id) % SERIES_LOOK.length];
            return (
              <span key={s.id} className="inline-flex items-center gap-1.5">
                <svg width="28" height="12" aria-hidden="true">
                  <rect x="0" y="1" width="28" height="10" fill={look.stroke} opacity={0.15} />
                  <line x1="0" x2="28" y1="6" y2="6" stroke={look.stroke} strokeWidth={2} strokeDasharray={look.dash} />
                </svg>
                {s.name}
              </span>
            );
          })}
          {limits.map((l) => (
            <LegendKey key={l.value_mgPerM3} swatch="w-6 border-t-2 border-dashed border-act">
              Limit {plain(l.value_mgPerM3)} mg/m³{limits.length > 1 ? ` (${l.names.join(', ')})` : ''}
            </LegendKey>
          ))}
          <span className="text-muted">Shaded: 95 % confidence band</span>
          <label className="ml-auto inline-flex items-center gap-1.5">
            <input type="checkbox" className="accent-accent" checked={log} onChange={(e) => setLog(e.target.checked)} />
            Logarithmic concentration axis
          </label>
        </figcaption>
      }
      label={`Breathing-zone ${word} concentration over time for ${series.map((s) => s.name).join(', ')}`}
      axes={{
        x,
        y,
        left: {
          label: `${FRACTION_LABEL[fraction]} concentration (mg/m³)`,
          labelOffset: 56,
          numTicks: log ? LOG_DECADES : 6,
          format: (v) => plain(v, 2),
        },
        bottom: { label: 'Time since the task started (min)', labelOffset: 16, numTicks: 10, format: plain },
      }}
      footer={
        log && (
          <p className="mt-1 text-xs text-muted">
            On the logarithmic axis, values below {plain(floor, 2)} mg/m³, zero included, are drawn on the bottom edge.
          </p>
        )
      }
    >
      <GridRows scale={y} width={INNER_W} numTicks={log ? LOG_DECADES : 6} stroke={LINE} strokeOpacity={0.7} />
      {series.map((s) => {
        const look = SERIES_LOOK[columns.findIndex((c) => c.id === s.id) % SERIES_LOOK.length];
        return (
          <g key={s.id} data-testid="compare-series">
            <Area data={s.points} x={(p) => x(p.t_min)} y0={(p) => yOf(p.lo)} y1={(p) => yOf(p.hi)} fill={look.stroke} fillOpacity={0.13} />
            <LinePath
              data={s.points}
              x={(p) => x(p.t_min)}
              y={(p) => yOf(p.mean)}
              stroke={look.stroke}
              strokeWidth={2}
              strokeDasharray={look.dash}
            />
          </g>
        );
      })}
      {limits.map((l) => (
        <ReferenceLine key={l.value_mgPerM3} y={yOf(l.value_mgPerM3)} width={INNER_W} />
      ))}
    </ChartFigure>
  );
}
