import { useMemo } from 'react';
import type { Scenario } from '../../../../shared/schemas/scenario';
import { usePlayback } from '@/features/run-results/hooks/use-playback';
import type { RunResult, Trajectories } from '../../../../shared/schemas/run-result';
import { projection } from '@/features/run-results/lib/room-projection';
import { sizeClasses } from '@/features/run-results/lib/size-classes';
import { BASE_RATE_sPerS, frameDots, frameTime_s, visibleFrom } from '@/features/run-results/lib/trajectory-frames';
import { ParticleLayer, TAIL_FRAMES } from './particle-layer';
import { PathTraces, tracedCount } from './path-traces';
import { PlaybackControls } from './playback-controls';
import { DRAWING_WIDTH, RoomView } from './room-view';
import { Section } from './section';

export function SizeLegend({ sizes }: { sizes: ReturnType<typeof sizeClasses> }) {
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

const TAIL_SECONDS = (t: Trajectories) => Math.round(TAIL_FRAMES * t.frameInterval_s);

export function ParticleViews({ view, scenario }: { view: RunResult; scenario: Scenario }) {
  const t = view.trajectories;
  const play = usePlayback(t.frames, t.frameInterval_s);
  const sizes = useMemo(
    () => sizeClasses(view.engine.sizeBins || Math.max(0, ...t.bins) + 1, view.sizeBins.aerodynamic_m),
    [view.engine.sizeBins, t.bins, view.sizeBins.aerodynamic_m],
  );
  const from = useMemo(() => visibleFrom(t), [t]);
  const dots = useMemo(() => frameDots(t, play.frame, from), [t, play.frame, from]);
  const plan = projection(scenario.room, 'plan', DRAWING_WIDTH);
  const elevation = projection(scenario.room, 'elevation', DRAWING_WIDTH);
  const sampled = t.bins.filter((b) => b >= 0).length;
  if (t.frames === 0 || sampled === 0) {
    return (
      <Section title="Particle paths, plan and elevation">
        <p className="text-sm text-muted">This run holds no sampled particle paths.</p>
      </Section>
    );
  }
  // On screen the animation's current frame; on paper every sampled path over the recorded window.
  const layers = (p: typeof plan) => (
    <>
      <g className="print:hidden">
        <ParticleLayer dots={dots} p={p} t={t} frame={play.frame} from={from} sizes={sizes} room={scenario.room} />
      </g>
      <g className="hidden print:inline">
        <PathTraces p={p} t={t} from={from} sizes={sizes} room={scenario.room} />
      </g>
    </>
  );
  const intro = `A sample of the simulated particles, drawn to scale; dots are sized and coloured by size class${sizes.byDiameter ? '' : ' (this result does not carry bin diameters, so classes are bin indices, smallest first)'}. At 1× the animation shows ${BASE_RATE_sPerS} simulated seconds per second.`;
  return (
    <Section title="Particle paths, plan and elevation" intro={intro}>
      <PlaybackControls
        frame={play.frame}
        frames={t.frames}
        time_s={frameTime_s(t, play.frame)}
        end_s={frameTime_s(t, t.frames - 1)}
        playing={play.playing}
        speed={play.speed}
        onToggle={play.toggle}
        onSeek={play.seek}
        onSpeed={play.setSpeed}
      />
      <div className="mt-3 grid gap-4 lg:grid-cols-[minmax(0,48rem)_minmax(0,1fr)]">
        <div className="grid gap-4 print:grid-cols-2">
          <figure className="rounded-lg border border-line bg-white p-3">
            <figcaption className="mb-1 text-sm font-semibold">Plan (seen from above)</figcaption>
            <RoomView
              scenario={scenario}
              p={plan}
              label={`Plan view of the ${scenario.room.length_m} by ${scenario.room.width_m} m room with ${dots.length} airborne particles`}
              over={layers(plan)}
            />
          </figure>
          <figure className="rounded-lg border border-line bg-white p-3">
            <figcaption className="mb-1 text-sm font-semibold">Elevation (side view, looking along y)</figcaption>
            <RoomView
              scenario={scenario}
              p={elevation}
              label={`Elevation of the room, ${scenario.room.height_m} m high, with ${dots.length} airborne particles`}
              over={layers(elevation)}
            />
          </figure>
        </div>
        <aside aria-label="Key to the particle views" className="space-y-4 text-sm lg:sticky lg:top-4 lg:self-start">
          <p className="hidden rounded-lg border border-line bg-white p-3 print:block">
            On paper: the whole recorded paths over the first {Math.round(frameTime_s(t, t.frames - 1) / 60)} min, a dot at each recorded
            position; {tracedCount(t, from)} of the {sampled} sampled particles were airborne at one frame at least.
          </p>
          <p className="rounded-lg border border-line bg-white p-3 print:hidden">
            <span className="block text-2xl font-semibold tabular-nums" data-testid="airborne-count">
              {dots.length}
            </span>
            of {sampled} sampled particles airborne at t = {frameTime_s(t, play.frame).toFixed(0)} s
          </p>
          <div>
            <h3 className="mb-1 font-semibold">Particle size</h3>
            <SizeLegend sizes={sizes} />
          </div>
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
                breathing zone, radius {scenario.worker.radius_m} m
              </li>
              <li>Faint lines: each particle&apos;s last {TAIL_SECONDS(t)} s</li>
            </ul>
          </div>
        </aside>
      </div>
    </Section>
  );
}
