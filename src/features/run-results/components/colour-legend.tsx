import { readableNumber, trimSig } from '../../../../shared/format/index';
import { rampColour, type SequentialScale } from '@/features/run-results/lib/colour-scale';
import { ACCENT, INK, MUTED } from '@/components/chart-style';

const W = 320;
const BAR = 14;

/** Colour bar with ticks and unit; an optional band marks a published range on the same scale. */
export function ColourLegend({
  scale,
  unit,
  title,
  band,
}: {
  scale: SequentialScale;
  unit: string;
  title: string;
  band?: { from: number; to: number; label: string };
}) {
  const stops = Array.from({ length: 11 }, (_, i) => i / 10);
  const gradient = `linear-gradient(to right, ${stops.map((s) => rampColour(s)).join(', ')})`;
  return (
    <div className="text-xs text-muted">
      <p className="mb-1 font-semibold text-ink">
        {title} ({unit}
        {scale.log ? ', log scale' : ''})
      </p>
      <div aria-hidden="true" style={{ width: W, height: BAR, background: gradient }} className="rounded-sm border border-line" />
      <svg width={W + 24} height={band ? 38 : 20} aria-hidden="true" className="-ml-3 overflow-visible">
        <g transform="translate(12 0)">
          {scale.ticks.map((t) => {
            const x = scale.position(t) * W;
            return (
              <g key={t} transform={`translate(${x} 0)`}>
                <line y2={4} stroke={MUTED} />
                <text y={15} textAnchor="middle" fontSize={11} fill={INK}>
                  {trimSig(t, 2)}
                </text>
              </g>
            );
          })}
          {band && (
            <g data-testid="legend-band">
              <rect
                x={scale.position(band.from) * W}
                width={Math.max(2, (scale.position(band.to) - scale.position(band.from)) * W)}
                y={21}
                height={4}
                fill={ACCENT}
              />
              {/* A band in the right half is labelled leftwards from its end, so the label stays inside the legend's width. */}
              <text
                x={(scale.position(band.from) > 0.5 ? Math.min(1, scale.position(band.to)) : scale.position(band.from)) * W}
                y={36}
                fontSize={11}
                fill={INK}
                textAnchor={scale.position(band.from) > 0.5 ? 'end' : 'start'}
              >
                {band.label}
              </text>
            </g>
          )}
        </g>
      </svg>
      <p className="sr-only">
        Scale from {readableNumber(scale.min)} to {readableNumber(scale.max)} {unit}
        {band ? `; ${band.label}` : ''}.
      </p>
    </div>
  );
}
