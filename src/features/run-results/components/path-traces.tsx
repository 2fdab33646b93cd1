import type { ReactElement } from 'react';
import type { Scenario } from '../../../../shared/schemas/scenario';
import type { Trajectories } from '../../../../shared/schemas/run-result';
import type { Projection } from '@/features/run-results/lib/room-projection';
import type { SizeClasses } from '@/features/run-results/lib/size-classes';
import { splitAtWrap, trail } from '@/features/run-results/lib/trajectory-frames';

const wholePath = (t: Trajectories, slot: number, from: Int32Array) => trail(t, slot, t.frames - 1, t.frames, from);

/** How many sampled particles were in the air at one recorded frame at least, and so show on paper. */
export function tracedCount(t: Trajectories, from: Int32Array): number {
  let n = 0;
  for (let slot = 0; slot < t.particles; slot++) if ((t.bins[slot] ?? -1) >= 0 && wholePath(t, slot, from).length > 0) n++;
  return n;
}

/**
 * Every sampled particle's whole path over the recorded window, for paper: a printed page cannot play the
 * animation, and one frame shows only the few particles airborne at that moment. A dot marks each recorded
 * position, so a particle a hood takes within one frame still shows where it went.
 */
export function PathTraces({
  p,
  t,
  from,
  sizes,
  room,
}: {
  p: Projection;
  t: Trajectories;
  from: Int32Array;
  sizes: SizeClasses;
  room: Scenario['room'];
}) {
  const marks: ReactElement[] = [];
  for (let slot = 0; slot < t.particles; slot++) {
    const c = sizes.classes[sizes.classOfBin(t.bins[slot] ?? -1)];
    if (!c) continue;
    const points = wholePath(t, slot, from);
    splitAtWrap(points, room.length_m, room.width_m).forEach((part, k) =>
      marks.push(
        <polyline
          key={`${slot}-line-${k}`}
          points={part.map(([x, y, z]) => p.toSvg(x, y, z).join(',')).join(' ')}
          fill="none"
          stroke={c.colour}
          strokeOpacity={0.55}
          strokeWidth={0.9}
        />,
      ),
    );
    points.forEach(([x, y, z], k) => {
      const [cx, cy] = p.toSvg(x, y, z);
      marks.push(<circle key={`${slot}-dot-${k}`} cx={cx} cy={cy} r={Math.max(1, c.radius * 0.6)} fill={c.colour} fillOpacity={0.7} />);
    });
  }
  return <g data-testid={`paths-${p.kind}`}>{marks}</g>;
}
