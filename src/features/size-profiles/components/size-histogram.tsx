import { AxisBottom, AxisLeft } from '@visx/axis';
import { GridRows } from '@visx/grid';
import { Group } from '@visx/group';
import { scaleLinear, scaleLog } from '@visx/scale';
import type { MassBins } from '../../../../shared/size-profiles/index';
import { formatSig } from '../../../../shared/format/index';
import { decadeTicks_um, histogramBars } from '@/features/size-profiles/lib/chart-data';
import { ACCENT, ACCENT_SOFT, CHART, LINE, MUTED, axisLabel, tickLabel } from './chart-style';

export function SizeHistogram({ bins }: { bins: MassBins }) {
  const bars = histogramBars(bins);
  const { width, height, margin } = CHART;
  const innerW = width - margin.left - margin.right;
  const innerH = height - margin.top - margin.bottom;
  const min_um = bars[0].lower_um;
  const max_um = bars[bars.length - 1].upper_um;
  const x = scaleLog({ domain: [min_um, max_um], range: [0, innerW] });
  const y = scaleLinear({ domain: [0, Math.max(...bars.map((b) => b.perLogWidth)) * 1.1], range: [innerH, 0], nice: true });
  return (
    <figure className="rounded-lg border border-line bg-white p-3">
      <figcaption className="mb-2 text-sm font-semibold">Mass distribution (histogram, per unit of log width)</figcaption>
      <svg
        viewBox={`0 0 ${width} ${height}`}
        className="h-auto w-full"
        role="img"
        aria-label={`Histogram of mass fraction per log width over ${bars.length} bins from ${formatSig(min_um, 3)} to ${formatSig(max_um, 3)} µm`}
      >
        <Group left={margin.left} top={margin.top}>
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
          <AxisLeft
            scale={y}
            numTicks={5}
            stroke={MUTED}
            tickStroke={MUTED}
            tickLabelProps={() => ({ ...tickLabel, textAnchor: 'end', dx: -4, dy: 4 })}
            label="dM/dlog d (mass fraction per decade)"
            labelProps={{ ...axisLabel, textAnchor: 'middle' }}
            labelOffset={36}
          />
          <AxisBottom
            top={innerH}
            scale={x}
            tickValues={decadeTicks_um(min_um, max_um)}
            tickFormat={(v) => String(Number(v))}
            stroke={MUTED}
            tickStroke={MUTED}
            tickLabelProps={() => ({ ...tickLabel, textAnchor: 'middle' })}
            label="Aerodynamic diameter (µm, log scale)"
            labelProps={{ ...axisLabel, textAnchor: 'middle' }}
            labelOffset={16}
          />
        </Group>
      </svg>
    </figure>
  );
}
