import { FATE_LABEL, FATES } from '../../../../shared/vocabulary/index';
import { FATE_COLOUR } from '@/features/run-results/lib/fate-colours';
import type { SizeClasses } from '@/features/run-results/lib/size-classes';

export function SizeLegend({ sizes }: { sizes: SizeClasses }) {
  return (
    <ul className="space-y-1" aria-label="Particle size classes">
      {sizes.classes.map((c) => (
        <li key={c.label} className="flex items-center gap-2">
          <svg width={14} height={14} aria-hidden="true">
            <circle cx={7} cy={7} r={c.radius + 1} fill={c.colour} />
          </svg>
          {c.label}
        </li>
      ))}
    </ul>
  );
}

/** counts: sampled paths per fate in FATES order (fateCounts). */
export function FateLegend({ counts }: { counts: readonly number[] }) {
  return (
    <ul className="space-y-1" aria-label="Particle fates">
      {FATES.map((f, i) => (
        <li key={f} className="flex items-center gap-2">
          <svg width={14} height={14} aria-hidden="true">
            <circle cx={7} cy={7} r={5} fill={FATE_COLOUR[f]} />
          </svg>
          <span>
            {FATE_LABEL[f]} <span className="text-muted tabular-nums">({counts[i]})</span>
          </span>
        </li>
      ))}
    </ul>
  );
}

export function MarkerLegend({ radius_m, tail_s }: { radius_m: number; tail_s: number }) {
  return (
    <div>
      <h3 className="mb-1 font-semibold">Markers</h3>
      <ul className="space-y-1 text-muted">
        <li>
          <span aria-hidden="true" className="text-ink">
            ◇
          </span>{' '}
          dust source
        </li>
        <li>
          <span aria-hidden="true" className="font-bold text-act">
            ▕
          </span>{' '}
          hood face, arrow: air drawn in
        </li>
        <li>
          <span aria-hidden="true" className="text-ink">
            ◌
          </span>{' '}
          breathing zone, radius {radius_m} m
        </li>
        <li>Faint lines: each particle&apos;s last {tail_s} s</li>
      </ul>
    </div>
  );
}
