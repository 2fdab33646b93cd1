import { hypot3 } from '../det-math/index';
import { hoodAxis } from '../schemas/hood-axis';
import type { ReleaseCondition } from './capture-velocity';

type Point = { x_m: number; y_m: number; z_m: number };
type Direction = { x: number; y: number; z: number } | { azimuth_deg: number; elevation_deg?: number };
export type Vector3 = [number, number, number];

export interface DefaultJet {
  speed_mPerS: number;
  diameter_m: number;
  /** Every default is common practice [P], calibrated against the capture-velocity table, not measured. */
  tag: '[P]';
  reasoning: string;
}

// [M] from memory, Pope, Turbulent Flows ch. 5: centre-line decay constant B = 5.8–6.1 for a round jet.
export const JET_DECAY_CONSTANT = 6;
// [P] common practice: close-capture hoods are set about 0.3 m from the work, the stone bench demo's distance.
export const JET_REFERENCE_DISTANCE_m = 0.3;

// Each default's centre-line speed at 0.3 m is the geometric middle of its release type's capture range
// (capture-velocity.ts): the air the release itself moves there is what the hood has to overpower.
export const DEFAULT_JETS: Record<ReleaseCondition, DefaultJet | null> = {
  quiet: null,
  low: {
    speed_mPerS: 0.7,
    diameter_m: 0.1,
    tag: '[P]',
    reasoning: 'Powder poured or scooped into a container drags air along at well under 1 m/s across the width of the stream.',
  },
  active: {
    speed_mPerS: 1.6,
    diameter_m: 0.15,
    tag: '[P]',
    reasoning: "A tipped sack's stream falls 0.3–0.5 m (2.4–3.1 m/s free fall) and drags air at about half that across the sack mouth.",
  },
  high: {
    speed_mPerS: 5,
    diameter_m: 0.05,
    tag: '[P]',
    reasoning: 'A grinding wheel or disc sander throws induced air of a few m/s off the wheel, in a stream about half the wheel wide.',
  },
};

export function defaultJet(release: ReleaseCondition): DefaultJet | null {
  if (!Object.hasOwn(DEFAULT_JETS, release)) throw new RangeError(`release must be quiet, low, active or high, got ${String(release)}`);
  return DEFAULT_JETS[release];
}

// Round free jet: u = u₀ in the potential core, then u_c = B·u₀·d₀/x (Pope ch. 5; the virtual origin is neglected).
export function jetCentrelineSpeed_mPerS(speed_mPerS: number, diameter_m: number, distance_m: number): number {
  const core_m = JET_DECAY_CONSTANT * diameter_m;
  return distance_m <= core_m ? speed_mPerS : (JET_DECAY_CONSTANT * speed_mPerS * diameter_m) / distance_m;
}

// The cautious default: the release blows straight at the nose. A worker standing in the source gets an upward jet.
export function towardBreathingZone(source: Point, worker: Point): Vector3 {
  const d: Vector3 = [worker.x_m - source.x_m, worker.y_m - source.y_m, worker.z_m - source.z_m];
  const length = hypot3(d[0], d[1], d[2]);
  return length > 1e-9 ? [d[0] / length, d[1] / length, d[2] / length] : [0, 0, 1];
}

export interface ResolvedJet {
  speed_mPerS: number;
  diameter_m: number;
  direction: Vector3;
  fromDefault: boolean;
}

/** The jet a scenario asks for: its own, else its release type's default; null for none or a jet of zero speed. */
export function resolveJet(
  source: Point & { releaseType?: ReleaseCondition; jet?: { speed_mPerS: number; diameter_m: number; direction?: Direction } },
  worker: Point,
): ResolvedJet | null {
  const base = source.jet ?? (source.releaseType ? defaultJet(source.releaseType) : null);
  if (!base || !(base.speed_mPerS > 0)) return null;
  const given = source.jet?.direction;
  return {
    speed_mPerS: base.speed_mPerS,
    diameter_m: base.diameter_m,
    direction: given ? hoodAxis(given) : towardBreathingZone(source, worker),
    fromDefault: !source.jet,
  };
}

/**
 * The same scenario with its release jet's speed times factor (the default jet made explicit), for
 * the ±2× sensitivity the jet's common-practice defaults call for; a scenario without a jet is returned as it is.
 */
export function withJetSpeedScaled<S extends { source: Parameters<typeof resolveJet>[0]; worker: Point }>(scenario: S, factor: number): S {
  if (!(factor > 0)) throw new RangeError(`factor must be above zero, got ${factor}`);
  const jet = resolveJet(scenario.source, scenario.worker);
  if (!jet) return scenario;
  const [x, y, z] = jet.direction;
  return {
    ...scenario,
    source: { ...scenario.source, jet: { speed_mPerS: jet.speed_mPerS * factor, diameter_m: jet.diameter_m, direction: { x, y, z } } },
  };
}
