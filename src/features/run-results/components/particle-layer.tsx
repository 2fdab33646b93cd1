import type { Scenario } from '../../../../shared/schemas/scenario';
import type { Projection } from '@/features/run-results/lib/room-projection';
import type { SizeClasses } from '@/features/run-results/lib/size-classes';
import { type Dot, splitAtWrap, trail } from '@/features/run-results/lib/trajectory-frames';
import type { Trajectories } from '../../../../shared/schemas/run-result';

export const TAIL_FRAMES = 8;

// A short fading tail turns a cloud of dots into visible paths without drawing 150 frames per particle.
export function ParticleLayer({
  dots,
  p,
  t,
  frame,
  from,
  sizes,
  room,
}: {
  dots: Dot[];
  p: Projection;
  t: Trajectories;
  frame: number;
  from: Int32Array;
  sizes: SizeClasses;
  room: Scenario['room'];
}) {
  return (
    <g data-testid={`dots-${p.kind}`}>
      {dots.map((d) => {
        const c = sizes.classes[sizes.classOfBin(d.bin)];
        if (!c) return null;
        const tails = splitAtWrap(trail(t, d.slot, frame, TAIL_FRAMES, from), room.length_m, room.width_m).map((part) =>
          part.map(([x, y, z]) => p.toSvg(x, y, z)),
        );
        const [cx, cy] = p.toSvg(d.x_m, d.y_m, d.z_m);
        return (
          <g key={d.slot}>
            {tails.map((tail, k) => (
              <polyline
                key={k}
                points={tail.map((q) => q.join(',')).join(' ')}
                fill="none"
                stroke={c.colour}
                strokeOpacity={0.4}
                strokeWidth={1.2}
              />
            ))}
            <circle cx={cx} cy={cy} r={c.radius} fill={c.colour} stroke="white" strokeWidth={0.6} data-slot={d.slot} />
          </g>
        );
      })}
    </g>
  );
}
