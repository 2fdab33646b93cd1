import { AxisBottom, AxisLeft, type AxisScale } from '@visx/axis';
import { MUTED, axisLabel, tickLabel } from '@/components/chart-style';

export type AxisSpec = {
  label: string;
  labelOffset: number;
  tickValues?: number[];
  numTicks?: number;
  format?: (value: number) => string;
};

// visx passes (value, index, ticks); the wrapper keeps a formatter's optional second argument from receiving the index.
const formatter = (format: AxisSpec['format']) => format && ((v: unknown) => format(Number(v)));

export function ChartAxes({
  x,
  y,
  innerH,
  left,
  bottom,
}: {
  x: AxisScale;
  y: AxisScale;
  innerH: number;
  left: AxisSpec;
  bottom: AxisSpec;
}) {
  return (
    <>
      <AxisLeft
        scale={y}
        tickValues={left.tickValues}
        numTicks={left.numTicks}
        tickFormat={formatter(left.format)}
        stroke={MUTED}
        tickStroke={MUTED}
        tickLabelProps={() => ({ ...tickLabel, textAnchor: 'end', dx: -4, dy: 4 })}
        label={left.label}
        labelProps={{ ...axisLabel, textAnchor: 'middle' }}
        labelOffset={left.labelOffset}
      />
      <AxisBottom
        top={innerH}
        scale={x}
        tickValues={bottom.tickValues}
        numTicks={bottom.numTicks}
        tickFormat={formatter(bottom.format)}
        stroke={MUTED}
        tickStroke={MUTED}
        tickLabelProps={() => ({ ...tickLabel, textAnchor: 'middle' })}
        label={bottom.label}
        labelProps={{ ...axisLabel, textAnchor: 'middle' }}
        labelOffset={bottom.labelOffset}
      />
    </>
  );
}
