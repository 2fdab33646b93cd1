import { defaultJet, towardBreathingZone } from '../../../../shared/physics/release-jets';
import type { ReleaseType, ScenarioInput } from '../../../../shared/schemas/scenario';
import { hoodAngles } from './hood-axis';

type S = ScenarioInput;
export type JetInput = NonNullable<S['source']['jet']>;

// [P] common practice: a quiet release has no default jet; 50 mm is a hand tool's stream, a start for the engineer's own.
const QUIET_START = { speed_mPerS: 0, diameter_m: 0.05 };

/** The breathing-zone direction as the form shows directions: azimuth in plan and tilt. */
export function breathingZoneAngles(s: S): { azimuth_deg: number; elevation_deg: number } {
  const [x, y, z] = towardBreathingZone(s.source, s.worker);
  const { azimuth_deg, tilt_deg } = hoodAngles({ x, y, z });
  return { azimuth_deg, elevation_deg: tilt_deg };
}

// Unticking "use the default" starts from the default itself, aimed where the default aims, so nothing jumps.
export function jetToEdit(s: S): JetInput {
  const release = s.source.releaseType;
  const base = (release && defaultJet(release)) || QUIET_START;
  const aim = breathingZoneAngles(s);
  // A tenth of a degree is finer than anyone aims a tool; the form shows what the engineer would type.
  const tenth = (deg: number) => Math.round(deg * 10) / 10;
  return {
    speed_mPerS: base.speed_mPerS,
    diameter_m: base.diameter_m,
    direction: { azimuth_deg: tenth(aim.azimuth_deg), elevation_deg: tenth(aim.elevation_deg) },
  };
}

export const withReleaseType = (s: S, releaseType: ReleaseType | undefined): S => ({ ...s, source: { ...s.source, releaseType } });
export const withJet = (s: S, jet: JetInput | undefined): S => ({ ...s, source: { ...s.source, jet } });
