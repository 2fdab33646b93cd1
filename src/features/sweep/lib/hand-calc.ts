import {
  captureVelocityRange,
  HOOD_FIT_COEFFICIENT as C,
  hoodCenterlineVelocity,
  hoodRequiredAirflow,
  type HoodGeometry,
  OPENING_DISTANCE_FACTOR,
  type ReleaseCondition,
} from '../../../../shared/physics/index';
import { BENCH_FACE_VELOCITY, BENCH_REACH_ABOVE_m } from '../../../../shared/physics/bench-face-velocity';
import { formatSig } from '../../../../shared/format/index';
import type { Hood } from '../../../../shared/schemas/scenario';
import { isBenchKind } from '../../../../shared/vocabulary/index';
import type { SweepParameter } from './sweep-points';

export type HandCalc =
  | { kind: 'airflow'; captureVelocity_mPerS: number; airflow_m3PerS: number; distance_m: number }
  | { kind: 'distance'; captureVelocity_mPerS: number; distance_m: number | null; airflow_m3PerS: number }
  | { kind: 'faceScale'; captureVelocity_mPerS: number; faceScale: number | null; airflow_m3PerS: number; distance_m: number };

/** The kinds the centre-line hand calculation covers: a downdraft bench is checked by its face velocity instead. */
export type CentreLineKind = Exclude<Hood['kind'], 'downdraft-bench'>;
export const handCalcCovers = (kind: Hood['kind']): kind is CentreLineKind => !isBenchKind(kind);

/** The published equation behind each answer, quoted in the sentence so the engineer can redo it by hand. */
export const HOOD_EQUATION: Record<CentreLineKind, string> = {
  plain: `Q = V (${OPENING_DISTANCE_FACTOR} X² + A)`,
  flanged: `Q = ${C.flanged} V (${OPENING_DISTANCE_FACTOR} X² + A)`,
  slot: `Q = ${C.slot} L V X`,
  'flanged-slot': `Q = ${C['flanged-slot']} L V X`,
  booth: 'Q = V W H',
};

// The engine reads faceWidth as a slot's length, so the hand calculation does the same.
export function hoodGeometry(hood: Pick<Hood, 'kind' | 'faceWidth_m' | 'faceHeight_m'>): HoodGeometry {
  return { kind: hood.kind, faceArea_m2: hood.faceWidth_m * hood.faceHeight_m, slotLength_m: hood.faceWidth_m };
}

/**
 * The design capture velocity is the low end of the published range for the release type: the
 * least a designer may choose, so the comparison with the simulation is not padded by a margin.
 */
export const designCaptureVelocity_mPerS = (release: ReleaseCondition) => captureVelocityRange(release).min_mPerS;

// Centre-line velocity falls monotonically with distance, so bisection finds where it meets V.
function reachAt(hood: Hood, velocity_mPerS: number): number | null {
  const geometry = hoodGeometry(hood);
  const speed = (x: number) => hoodCenterlineVelocity({ ...geometry, airflow_m3PerS: hood.airflow_m3PerS }, x);
  if (hood.kind === 'booth' || speed(0) < velocity_mPerS) return null;
  let lo = 0;
  let hi = 1;
  while (speed(hi) >= velocity_mPerS && hi < 1e3) hi *= 2;
  for (let i = 0; i < 80; i++) {
    const mid = (lo + hi) / 2;
    if (speed(mid) >= velocity_mPerS) lo = mid;
    else hi = mid;
  }
  return lo;
}

// Q = V·f(X) grows with face area for openings and with slot length for slots, so the largest face that still reaches V at X is the answer.
function largestFaceScale(hood: Hood, velocity_mPerS: number, distance_m: number): number | null {
  const reaches = (s: number) =>
    hoodRequiredAirflow(
      hoodGeometry({ ...hood, faceWidth_m: hood.faceWidth_m * s, faceHeight_m: hood.faceHeight_m * s }),
      velocity_mPerS,
      distance_m,
    ) <= hood.airflow_m3PerS;
  if (hood.kind === 'booth' || !reaches(1e-6)) return null;
  let lo = 1e-6;
  let hi = 1;
  while (reaches(hi) && hi < 1e3) hi *= 2;
  for (let i = 0; i < 80; i++) {
    const mid = (lo + hi) / 2;
    if (reaches(mid)) lo = mid;
    else hi = mid;
  }
  return lo;
}

/** The Dalla Valle / ACGIH answer to the same question the sweep asks, at the scenario's own hood and source distance. */
export function handCalcAnswer(hood: Hood, distance_m: number, release: ReleaseCondition, parameter: SweepParameter): HandCalc {
  const v = designCaptureVelocity_mPerS(release);
  if (parameter === 'airflow')
    return {
      kind: 'airflow',
      captureVelocity_mPerS: v,
      airflow_m3PerS: hoodRequiredAirflow(hoodGeometry(hood), v, Math.max(0, distance_m)),
      distance_m,
    };
  if (parameter === 'distance')
    return { kind: 'distance', captureVelocity_mPerS: v, distance_m: reachAt(hood, v), airflow_m3PerS: hood.airflow_m3PerS };
  return {
    kind: 'faceScale',
    captureVelocity_mPerS: v,
    faceScale: largestFaceScale(hood, v, Math.max(0, distance_m)),
    airflow_m3PerS: hood.airflow_m3PerS,
    distance_m,
  };
}

/** What stands in for the hand calculation on a downdraft bench, which the centre-line equations do not cover. */
export function benchHandCalcSentence(hood: Pick<Hood, 'faceWidth_m' | 'faceHeight_m' | 'airflow_m3PerS'>): string {
  const faceVelocity_mPerS = hood.airflow_m3PerS / (hood.faceWidth_m * hood.faceHeight_m);
  const range = `${formatSig(BENCH_FACE_VELOCITY.min_mPerS, 2)}–${formatSig(BENCH_FACE_VELOCITY.max_mPerS, 2)} m/s`;
  return `The centre-line hand calculation covers capturing hoods, slots and booths, not a downdraft bench. A bench is checked by its face velocity over the work surface instead: ${formatSig(faceVelocity_mPerS, 2)} m/s here, against ${range} for downdraft benches (common practice; confirm against local guidance). It does not change with the distance, but holds only while the source is over the work surface, at most ${formatSig(BENCH_REACH_ABOVE_m, 1)} m above it.`;
}
