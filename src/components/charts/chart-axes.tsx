import { AxisBottom, AxisLeft, type AxisScale } from '@visx/axis';
import { MUTED, axisLabel, tickLabel } from '@/components/chart-style';

export type AxisSpec = {
  label: string;
  labelOffset: number;
  tickValues?: number[];
  numTicks?: number;
  format?: (value: number) => string;
};

export type AxesSpec = { x: AxisScale; y: AxisScale; left: AxisSpec; bottom: AxisSpec };

// visx passes (value, index, ticks); the wrapper keeps a formatter's optional second argument from receiving the index.
const formatter = (format: AxisSpec['format']) => format && ((v: unknown) => format(Number(v)));

// Both axes look alike; only where the tick labels sit differs.
const look = (spec: AxisSpec) =>
  ({
    tickValues: spec.tickValues,
    numTicks: spec.numTicks,
    tickFormat: formatter(spec.format),
    stroke: MUTED,
    tickStroke: MUTED,
    label: spec.label,
    labelProps: { ...axisLabel, textAnchor: 'middle' },
    labelOffset: spec.labelOffset,
  }) as const;

export function ChartAxes({ x, y, left, bottom, innerH }: AxesSpec & { innerH: number }) {
  return (
    <>
      <AxisLeft scale={y} {...look(left)} tickLabelProps={() => ({ ...tickLabel, textAnchor: 'end', dx: -4, dy: 4 })} />
      <AxisBottom top={innerH} scale={x} {...look(bottom)} tickLabelProps={() => ({ ...tickLabel, textAnchor: 'middle' })} />
    </>
  );
}
