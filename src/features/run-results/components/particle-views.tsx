import { useMemo, useState } from 'react';
import { FATES } from '../../../../shared/vocabulary/index';
import type { Scenario } from '../../../../shared/schemas/scenario';
import type { RunResult } from '../../../../shared/schemas/run-result';
import { ChoiceChips } from '@/components/ui/choice-chips';
import { useViewZoom } from '@/hooks/use-view-zoom';
import { usePlayback } from '@/features/run-results/hooks/use-playback';
import { FATE_COLOUR } from '@/features/run-results/lib/fate-colours';
import { buildPaths, busiestTime_s, fateCounts, type Path, positionAt } from '@/features/run-results/lib/path-sample';
import { focusPoints, projection, viewSpan } from '@/features/run-results/lib/room-projection';
import { sizeClasses } from '@/features/run-results/lib/size-classes';
import { baseRate_sPerS } from '@/features/run-results/lib/trajectory-frames';
import { type DotStyle, ParticleLayer } from './particle-layer';
import { PathTraces } from './path-traces';
import { PlaybackControls } from './playback-controls';
import { DRAWING_WIDTH, RoomView } from './room-view';
import { Section } from './section';
import { FateLegend, MarkerLegend, SizeLegend } from './particle-legends';

export const TAIL_FRAMES = 4;
type ColourBy = 'fate' | 'size';
const COLOUR_WORD: Record<ColourBy, string> = { fate: 'Where it ends up', size: 'Size' };

export function ParticleViews({ view, scenario }: { view: RunResult; scenario: Scenario }) {
  const t = view.trajectories;
  // Results with path ends record frames over the whole run; older ones stop at their last frame.
  const end_s = (t.ends ? t.frames : Math.max(0, t.frames - 1)) * t.frameInterval_s;
  const rate = baseRate_sPerS(end_s);
  const paths = useMemo(() => buildPaths(t), [t]);
  // Paused at first where most sampled particles are airborne, so the views open on the plume, not on an empty room.
  const play = usePlayback(
    end_s,
    rate,
    useMemo(() => busiestTime_s(paths, end_s, t.frameInterval_s), [paths, end_s, t.frameInterval_s]),
  );
  const hasFates = !!t.fates;
  const [colourBy, setColourBy] = useState<ColourBy>(hasFates ? 'fate' : 'size');
  const sizes = useMemo(
    () => sizeClasses(view.engine.sizeBins || Math.max(0, ...t.bins) + 1, view.sizeBins.aerodynamic_m),
    [view.engine.sizeBins, t.bins, view.sizeBins.aerodynamic_m],
  );
  const counts = useMemo(() => fateCounts(paths), [paths]);
  const planZoom = useViewZoom(viewSpan(scenario.room, 'plan'), focusPoints(scenario, 'plan'));
  const elevationZoom = useViewZoom(viewSpan(scenario.room, 'elevation'), focusPoints(scenario, 'elevation'));
  const plan = projection(scenario.room, 'plan', DRAWING_WIDTH, planZoom.window);
  const elevation = projection(scenario.room, 'elevation', DRAWING_WIDTH, elevationZoom.window);
  if (paths.length === 0) {
    return (
      <Section title="Particle paths, plan and elevation">
        <p className="text-sm text-muted">This run holds no sampled particle paths.</p>
      </Section>
    );
  }
  const by = hasFates ? colourBy : 'size';
  const styleOf = (path: Path): DotStyle | undefined => {
    const c = sizes.classes[sizes.classOfBin(path.bin)];
    if (!c) return undefined;
    if (by === 'size') return c;
    const fate = FATES[path.fate];
    return fate ? { colour: FATE_COLOUR[fate], radius: c.radius } : undefined;
  };
  const airborne = paths.filter((p) => positionAt(p, play.time_s)).length;
  const tail_s = TAIL_FRAMES * t.frameInterval_s;
  const intro = `${paths.length} simulated particles sampled over the whole run, drawn to scale and sized by size class${sizes.byDiameter ? '' : ' (this result does not carry bin diameters, so classes are bin indices, smallest first)'}. At 1× the animation shows ${rate} simulated seconds per second. Both views open zoomed on the workstation.`;
  // On screen the animation at its current time; on paper every sampled path over the whole run.
  const layer = (p: typeof plan) => (
    <>
      <g className="print:hidden">
        <ParticleLayer paths={paths} p={p} time_s={play.time_s} tail_s={tail_s} styleOf={styleOf} room={scenario.room} />
      </g>
      <g className="hidden print:inline">
        <PathTraces paths={paths} p={p} styleOf={styleOf} room={scenario.room} />
      </g>
    </>
  );
  return (
    <Section title="Particle paths, plan and elevation" intro={intro}>
      <PlaybackControls
        time_s={play.time_s}
        end_s={end_s}
        step_s={t.frameInterval_s}
        playing={play.playing}
        speed={play.speed}
        onToggle={play.toggle}
        onSeek={play.seek}
        onSpeed={play.setSpeed}
      />
      {hasFates && (
        <div className="no-print mt-3">
          <ChoiceChips
            legend="Colour the particles by"
            caption="Colour by"
            options={['fate', 'size'] as const}
            value={colourBy}
            onChange={setColourBy}
            label={(c) => COLOUR_WORD[c]}
          />
        </div>
      )}
      <div className="mt-3 grid gap-4 lg:grid-cols-[minmax(0,48rem)_minmax(0,1fr)]">
        <div className="grid min-w-0 gap-4">
          <figure className="min-w-0 rounded-lg border border-line bg-white p-3">
            <figcaption className="mb-1 text-sm font-semibold">Plan (seen from above)</figcaption>
            <RoomView
              scenario={scenario}
              p={plan}
              zoom={planZoom}
              what="plan"
              label={`Plan view of the ${scenario.room.length_m} by ${scenario.room.width_m} m room with ${airborne} airborne particles`}
              over={layer(plan)}
            />
          </figure>
          <figure className="min-w-0 rounded-lg border border-line bg-white p-3">
            <figcaption className="mb-1 text-sm font-semibold">Elevation (side view, looking along y)</figcaption>
            <RoomView
              scenario={scenario}
              p={elevation}
              zoom={elevationZoom}
              what="elevation"
              label={`Elevation of the room, ${scenario.room.height_m} m high, with ${airborne} airborne particles`}
              over={layer(elevation)}
            />
          </figure>
        </div>
        <aside aria-label="Key to the particle views" className="space-y-4 text-sm lg:sticky lg:top-4 lg:self-start">
          <p className="hidden rounded-lg border border-line bg-white p-3 print:block">
            On paper: the whole paths of the {paths.length} sampled particles over the {Math.round(end_s / 60)} min run, from release to
            where each ended.
          </p>
          <p className="rounded-lg border border-line bg-white p-3 print:hidden">
            <span className="block text-2xl font-semibold tabular-nums" data-testid="airborne-count">
              {airborne}
            </span>
            of {paths.length} sampled particles airborne at t = {Math.round(play.time_s)} s
          </p>
          {by === 'fate' ? (
            <div>
              <h3 className="mb-1 font-semibold">Where each particle ends up</h3>
              <FateLegend counts={counts} />
            </div>
          ) : (
            <div>
              <h3 className="mb-1 font-semibold">Particle size</h3>
              <SizeLegend sizes={sizes} />
            </div>
          )}
          {!hasFates && <p className="text-muted">This result was recorded before particle fates were kept, so colours show size only.</p>}
          <MarkerLegend radius_m={scenario.worker.radius_m} tail_s={Math.round(tail_s)} />
        </aside>
      </div>
    </Section>
  );
}
