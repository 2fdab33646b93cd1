import type { Scenario } from '../../../../shared/schemas/scenario';
import { type Path, pathBetween } from '@/features/run-results/lib/path-sample';
import type { Projection } from '@/features/run-results/lib/room-projection';
import { splitAtWrap } from '@/features/run-results/lib/trajectory-frames';
import type { DotStyle } from './particle-layer';

/**
 * Every sampled particle's whole path over the run, for paper: a printed page cannot play the
 * animation, and one frame shows only the few particles airborne at that moment.
 */
export function PathTraces({
  paths,
  p,
  styleOf,
  room,
}: {
  paths: readonly Path[];
  p: Projection;
  styleOf: (path: Path) => DotStyle | undefined;
  room: Scenario['room'];
}) {
  return (
    <g data-testid={`paths-${p.kind}`}>
      {paths.flatMap((path) => {
        const style = styleOf(path);
        if (!style || path.times_s.length === 0) return [];
        const whole = pathBetween(path, path.times_s[0], path.times_s[path.times_s.length - 1]);
        return splitAtWrap(whole, room.length_m, room.width_m).map((part, k) => (
          <polyline
            key={`${path.slot}-${k}`}
            points={part.map(([x, y, z]) => p.toSvg(x, y, z).join(',')).join(' ')}
            fill="none"
            stroke={style.colour}
            strokeOpacity={0.55}
            strokeWidth={0.9}
          />
        ));
      })}
    </g>
  );
}
