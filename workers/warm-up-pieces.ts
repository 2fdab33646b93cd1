import { HOOD_KINDS } from '../shared/vocabulary/hood-kinds';
import { parseScenario, type Scenario } from '../shared/schemas/scenario';
import { referenceScenario } from './engine/reference-scenario';

/** Particles in the one batch (of two) a warm-up piece runs: enough to take every branch of the step loop, few enough to be done in moments. */
export const WARM_UP_PARTICLES = 100;

const base = {
  ...referenceScenario,
  name: 'Warm-up',
  source: { ...referenceScenario.source, shape: 'disc', size_m: 0.2, jet: { speed_mPerS: 4, diameter_m: 0.1 } },
  limit: { fraction: 'respirable', value_mgPerM3: 0.1 },
  run: { particles: 2 * WARM_UP_PARTICLES, batches: 2, seed: 1 },
};
const hood = referenceScenario.hoods[0];
// A bench's work surface sits under the source; every other kind keeps the reference hood's place and size.
const hoodOfKind = (kind: (typeof HOOD_KINDS)[number]) =>
  kind === 'downdraft-bench'
    ? { ...hood, kind, x_m: 2, y_m: 2.5, z_m: 0.85, faceWidth_m: 1, faceHeight_m: 0.6, direction: { x: 0, y: 0, z: 1 } }
    : { ...hood, kind };

/**
 * Small throwaway runs a fresh worker takes before real work: one for every hood kind, one with no hood and bursts,
 * all with a release jet and a limit. V8 compiles the step loop for the branches it has seen; a run that takes one it
 * has not (another hood kind, a jet, bursts) throws the compiled loop away and pays the interpreter again, which cost
 * about 1 s on the first run of each kind of scenario (in Node, 40 batches of the bakery flanged hood: 1.90 s cold,
 * 0.61 s after these pieces, 0.58 s warm).
 */
export function warmUpPieces(): Scenario[] {
  return [
    ...HOOD_KINDS.map((kind) => ({ ...base, hoods: [hoodOfKind(kind)] })),
    {
      ...base,
      hoods: [],
      source: { ...base.source, emission: { kind: 'bursts', massPerEvent_mg: 50, eventsPerHour: 12, taskDuration_min: 60 } },
    },
  ].map((s) => parseScenario(s));
}

/** Batches of the page's own scenario a worker runs before the pieces (ownWarmUpPiece). */
export const OWN_WARM_UP_BATCHES = 6;
/** Particles in each of them: a run to a precision's batch (run-to-precision.ts PRECISION_BATCH_PARTICLES). */
export const OWN_WARM_UP_PARTICLES = 250;

/**
 * The scenario the page has open, as a throwaway warm-up: its own hoods, source, room and limit, a few small batches of a
 * fixed seed, no precision rule. The pieces above leave branches the open scenario takes unseen (a wall that collects, a
 * heavy size bin, a second hood), and V8 throws its compiled loop away at the first one: after the pieces, the first ten
 * batches of a real run still took about twice as long as the rest (Chromium, bakery flanged hood: 35–80 ms against
 * 15 ms), with the walk deoptimised three times for want of type feedback (Node, --trace-deopt).
 */
export function ownWarmUpPiece(scenario: Scenario): Scenario {
  const { precision: _precision, ...run } = scenario.run;
  return parseScenario({
    ...scenario,
    run: { ...run, particles: OWN_WARM_UP_BATCHES * OWN_WARM_UP_PARTICLES, batches: OWN_WARM_UP_BATCHES, seed: 'warm-up' },
  });
}
