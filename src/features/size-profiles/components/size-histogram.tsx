import { GridRows } from '@visx/grid';
import { scaleLinear, scaleLog } from '@visx/scale';
import type { MassBins } from '../../../../shared/size-profiles/index';
import { formatSig } from '../../../../shared/format/index';
import { decadeTicks_um, histogramBars } from '@/features/size-profiles/lib/chart-data';
import { ACCENT, ACCENT_SOFT, CHART, LINE, diameterAxis } from './chart-style';
import { ChartFigure, plotSize } from '@/components/charts/chart-figure';

export function SizeHistogram({ bins }: { bins: MassBins }) {
  const bars = histogramBars(bins);
  const { innerW, innerH } = plotSize(CHART);
  const min_um = bars[0].lower_um;
  const max_um = bars[bars.length - 1].upper_um;
  const x = scaleLog({ domain: [min_um, max_um], range: [0, innerW] });
  const y = scaleLinear({ domain: [0, Math.max(...bars.map((b) => b.perLogWidth)) * 1.1], range: [innerH, 0], nice: true });
  return (
    <ChartFigure
      box={CHART}
      caption={<figcaption className="mb-2 text-sm font-semibold">Mass distribution (histogram, per unit of log width)</figcaption>}
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
    </ChartFigure>
  );
}
