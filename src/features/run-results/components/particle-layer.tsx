import type { Scenario } from '../../../../shared/schemas/scenario';
import { type Path, pathBetween, positionAt } from '@/features/run-results/lib/path-sample';
import type { Projection } from '@/features/run-results/lib/room-projection';
import { splitAtWrap } from '@/features/run-results/lib/trajectory-frames';

export interface DotStyle {
  colour: string;
  radius: number;
}

// A short fading tail turns a cloud of dots into visible paths, and keeps dust a hood takes within
// a second on screen for a moment after it has gone.
export function ParticleLayer({
  paths,
  p,
  time_s,
  tail_s,
  styleOf,
  room,
}: {
  paths: readonly Path[];
  p: Projection;
  time_s: number;
  tail_s: number;
  styleOf: (path: Path) => DotStyle | undefined;
  room: Scenario['room'];
}) {
  return (
    <g data-testid={`dots-${p.kind}`}>
      {paths.map((path) => {
        const style = styleOf(path);
        if (!style) return null;
        const tails = splitAtWrap(pathBetween(path, time_s - tail_s, time_s), room.length_m, room.width_m).map((part) =>
          part.map(([x, y, z]) => p.toSvg(x, y, z)),
        );
        const at = positionAt(path, time_s);
        if (!at && tails.length === 0) return null;
        const dot = at && p.toSvg(...at);
        return (
          <g key={path.slot}>
            {tails.map((tail, k) => (
              <polyline
                key={k}
                points={tail.map((q) => q.join(',')).join(' ')}
                fill="none"
                stroke={style.colour}
                strokeOpacity={dot ? 0.45 : 0.25}
                strokeWidth={1.2}
              />
            ))}
            {dot && (
              <circle cx={dot[0]} cy={dot[1]} r={style.radius} fill={style.colour} stroke="white" strokeWidth={0.6} data-slot={path.slot} />
            )}
          </g>
        );
      })}
    </g>
  );
}
