import { GridColumns, GridRows } from '@visx/grid';
import { scaleLinear, scaleLog } from '@visx/scale';
import { LinePath } from '@visx/shape';
import type { MassBins } from '../../../../shared/size-profiles/index';
import { cumulativePoints, decadeTicks_um, fittedCumulative } from '@/features/size-profiles/lib/chart-data';
import { ACCENT, CHART, INK, LINE, MUTED, diameterAxis } from './chart-style';
import { FitLegend, type Fit } from './fit-legend';
import { ChartFigure, plotSize } from '@/components/charts/chart-figure';

export function CumulativeCurve({ bins, fit }: { bins: MassBins; fit: Fit | null }) {
  const points = cumulativePoints(bins);
  const { innerW, innerH } = plotSize(CHART);
  const min_um = points[0].d_um;
  const max_um = points[points.length - 1].d_um;
  const x = scaleLog({ domain: [min_um, max_um], range: [0, innerW] });
  const y = scaleLinear({ domain: [0, 100], range: [innerH, 0] });
  const ticks = decadeTicks_um(min_um, max_um);
  const mmad_um = fit ? fit.mmad_m * 1e6 : null;
  const curve = fit ? fittedCumulative(fit.mmad_m, fit.gsd, min_um, max_um) : [];
  return (
    <ChartFigure
      box={CHART}
      caption={
        <figcaption className="mb-2 text-sm">
          <span className="font-semibold">Cumulative mass below each size</span>
          <FitLegend fit={fit} data="At the bin edges" swatch="h-0.5 w-5 bg-accent" />
        </figcaption>
      }
      label="Cumulative mass fraction in percent against aerodynamic diameter on a log axis"
      axes={{
        x,
        y,
        left: { label: 'Cumulative mass (%)', labelOffset: 36, tickValues: [0, 25, 50, 75, 100] },
        bottom: diameterAxis(ticks),
      }}
    >
      <GridRows scale={y} width={innerW} tickValues={[0, 25, 50, 75, 100]} stroke={LINE} strokeOpacity={0.6} />
      <GridColumns scale={x} height={innerH} tickValues={ticks} stroke={LINE} strokeOpacity={0.4} />
      <LinePath data={points} x={(p) => x(p.d_um)} y={(p) => y(100 * p.F)} stroke={ACCENT} strokeWidth={2.5} />
      {curve.length > 0 && (
        <LinePath
          data={curve}
          x={(p) => x(p.d_um)}
          y={(p) => y(100 * p.value)}
          stroke={INK}
          strokeWidth={2}
          strokeDasharray="6 4"
          data-testid="fit-cumulative"
        />
      )}
      {points.map((p, i) => (
        <circle key={i} cx={x(p.d_um)} cy={y(100 * p.F)} r={2.5} fill="white" stroke={ACCENT} />
      ))}
      {mmad_um !== null && mmad_um >= min_um && mmad_um <= max_um && (
        <g>
          <line x1={x(mmad_um)} x2={x(mmad_um)} y1={y(50)} y2={innerH} stroke={MUTED} strokeDasharray="3 3" />
          <text x={x(mmad_um) + 4} y={y(50) - 6} fill={MUTED} fontSize={11}>
            fitted MMAD
          </text>
        </g>
      )}
    </ChartFigure>
  );
}
