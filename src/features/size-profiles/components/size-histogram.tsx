import { GridRows } from '@visx/grid';
import { scaleLinear, scaleLog } from '@visx/scale';
import type { MassBins } from '../../../../shared/size-profiles/index';
import { formatSig } from '../../../../shared/format/index';
import { LinePath } from '@visx/shape';
import { decadeTicks_um, fittedPerDecade, histogramBars } from '@/features/size-profiles/lib/chart-data';
import { ACCENT, ACCENT_SOFT, CHART, INK, LINE, diameterAxis } from './chart-style';
import { FitLegend, type Fit } from './fit-legend';
import { ChartFigure, plotSize } from '@/components/charts/chart-figure';

export function SizeHistogram({ bins, fit }: { bins: MassBins; fit: Fit | null }) {
  const bars = histogramBars(bins);
  const { innerW, innerH } = plotSize(CHART);
  const min_um = bars[0].lower_um;
  const max_um = bars[bars.length - 1].upper_um;
  const x = scaleLog({ domain: [min_um, max_um], range: [0, innerW] });
  const curve = fit ? fittedPerDecade(fit.mmad_m, fit.gsd, min_um, max_um) : [];
  const top = Math.max(...bars.map((b) => b.perLogWidth), ...curve.map((p) => p.value));
  const y = scaleLinear({ domain: [0, top * 1.1], range: [innerH, 0], nice: true });
  return (
    <ChartFigure
      box={CHART}
      caption={
        <figcaption className="mb-2 text-sm">
          <span className="font-semibold">Mass distribution (histogram, per unit of log width)</span>
          <FitLegend fit={fit} data="Bins as given" swatch="h-3 w-5 bg-accent-soft outline outline-1 outline-accent" />
        </figcaption>
      }
      label={`Histogram of mass fraction per log width over ${bars.length} bins from ${formatSig(min_um, 3)} to ${formatSig(max_um, 3)} µm`}
      axes={{
        x,
        y,
        left: { label: 'dM/dlog d (mass fraction per decade)', labelOffset: 36, numTicks: 5 },
        bottom: diameterAxis(decadeTicks_um(min_um, max_um)),
      }}
    >
      <GridRows scale={y} width={innerW} stroke={LINE} strokeOpacity={0.6} numTicks={5} />
      {bars.map((b, i) => (
        <rect
          key={i}
          x={x(b.lower_um)}
          width={Math.max(0.5, x(b.upper_um) - x(b.lower_um))}
          y={y(b.perLogWidth)}
          height={innerH - y(b.perLogWidth)}
          fill={ACCENT_SOFT}
          stroke={ACCENT}
          strokeWidth={1}
        >
          <title>{`${formatSig(b.lower_um, 3)}–${formatSig(b.upper_um, 3)} µm: ${formatSig(b.perLogWidth, 3)} per log width`}</title>
        </rect>
      ))}
      {curve.length > 0 && (
        <LinePath
          data={curve}
          x={(p) => x(p.d_um)}
          y={(p) => y(p.value)}
          stroke={INK}
          strokeWidth={2}
          strokeDasharray="6 4"
          data-testid="fit-per-decade"
        />
      )}
    </ChartFigure>
  );
}
