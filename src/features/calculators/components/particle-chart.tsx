import { GridColumns, GridRows } from '@visx/grid';
import { scaleLog } from '@visx/scale';
import { LinePath } from '@visx/shape';
import { useMemo } from 'react';
import { CHART_MAX_DIAMETER_m, CHART_MIN_DIAMETER_m } from '@/features/calculators/lib/crossover';
import { decadeTicks, diameterTick, logSpace, powerTick } from '@/features/calculators/lib/chart-ticks';
import { displayDiameter, plainNumber } from '@/features/calculators/lib/format';
import { particleProperties, type ParticleMedium } from '@/features/calculators/lib/particle-properties';
import { ACCENT, INK, LINE, MUTED, WATCH, halo } from '@/components/chart-style';
import { ChartFigure, plotSize } from '@/components/charts/chart-figure';
import { LegendKey } from '@/components/charts/legend-key';

const BOX = { width: 760, height: 380, margin: { top: 24, right: 24, bottom: 56, left: 76 } };

export default function ParticleChart({
  medium,
  crossover_m,
  diameter_m,
}: {
  medium: ParticleMedium;
  crossover_m: number | null;
  diameter_m: number;
}) {
  const points = useMemo(
    () => logSpace(CHART_MIN_DIAMETER_m, CHART_MAX_DIAMETER_m, 121).map((d) => particleProperties(d, medium)),
    [medium],
  );
  const values = points.flatMap((p) => [p.settlingDistance_m, p.rmsDisplacement_m]);
  const yMin = 10 ** Math.floor(Math.log10(Math.min(...values)));
  const yMax = 10 ** Math.ceil(Math.log10(Math.max(...values)));
  const { innerW, innerH } = plotSize(BOX);
  const x = scaleLog({ domain: [CHART_MIN_DIAMETER_m, CHART_MAX_DIAMETER_m], range: [0, innerW] });
  const y = scaleLog({ domain: [yMin, yMax], range: [innerH, 0] });
  const yTicks = decadeTicks(yMin, yMax).filter((_, i, all) => all.length <= 9 || i % 2 === 0);
  const xTicks = decadeTicks(CHART_MIN_DIAMETER_m, CHART_MAX_DIAMETER_m);
  const crossoverY = crossover_m === null ? null : particleProperties(crossover_m, medium).rmsDisplacement_m;
  const inRange = diameter_m >= CHART_MIN_DIAMETER_m && diameter_m <= CHART_MAX_DIAMETER_m;
  const over = `${plainNumber(medium.window_s)} s`;

  return (
    <ChartFigure
      box={BOX}
      caption={
        <figcaption className="mb-2 flex flex-wrap gap-x-5 gap-y-1 text-sm">
          <span className="font-semibold">Distance moved over {over}</span>
          <LegendKey swatch="h-0.5 w-5 bg-accent">Settling distance</LegendKey>
          <LegendKey swatch="w-5 border-t-2 border-dashed border-watch">RMS Brownian displacement</LegendKey>
        </figcaption>
      }
      label={`Log–log chart of settling distance and rms Brownian displacement over ${over} from 1 nm to 100 µm${crossover_m ? `; they cross at ${displayDiameter(crossover_m)}` : ''}`}
      axes={{
        x,
        y,
        left: { label: `Distance over ${over} (m)`, labelOffset: 46, tickValues: yTicks, format: powerTick },
        bottom: { label: 'Physical particle diameter (nm, µm; log scale)', labelOffset: 18, tickValues: xTicks, format: diameterTick },
      }}
    >
      <GridRows scale={y} width={innerW} tickValues={yTicks} stroke={LINE} strokeOpacity={0.6} />
      <GridColumns scale={x} height={innerH} tickValues={xTicks} stroke={LINE} strokeOpacity={0.6} />
      <LinePath data={points} x={(p) => x(p.diameter_m)} y={(p) => y(p.settlingDistance_m)} stroke={ACCENT} strokeWidth={2.5} />
      <LinePath
        data={points}
        x={(p) => x(p.diameter_m)}
        y={(p) => y(p.rmsDisplacement_m)}
        stroke={WATCH}
        strokeWidth={2.5}
        strokeDasharray="7 4"
      />
      {inRange && <line x1={x(diameter_m)} x2={x(diameter_m)} y1={0} y2={innerH} stroke={MUTED} strokeDasharray="2 3" />}
      {inRange && (
        <text x={x(diameter_m) + 4} y={12} fill={MUTED} fontSize={11} {...halo}>
          entered {displayDiameter(diameter_m)}
        </text>
      )}
      {crossover_m !== null && crossoverY !== null && (
        <g data-testid="crossover-marker">
          <line x1={x(crossover_m)} x2={x(crossover_m)} y1={y(crossoverY)} y2={innerH} stroke={INK} strokeWidth={1.5} />
          <circle cx={x(crossover_m)} cy={y(crossoverY)} r={5} fill="white" stroke={INK} strokeWidth={2} />
          <text x={x(crossover_m) + 8} y={y(crossoverY) - 10} fill={INK} fontSize={12} fontWeight={600} {...halo}>
            Equal at {displayDiameter(crossover_m)}
          </text>
        </g>
      )}
    </ChartFigure>
  );
}
