import { describe, expect, it } from 'vitest';
import { defaultScenario } from './default-scenario';
import { breathingZoneAngles, jetToEdit, withReleaseType } from './release-jet';

const room = {
  length_m: 6,
  width_m: 4,
  height_m: 3,
  airChanges_perH: 4,
  draftSpeed_mPerS: 0,
  draftDirection_deg: 0,
  temperature_K: 293.15,
};
// Worker 0.6 m along -y and 0.6 m above the source: 45° up, facing 270° in plan [C].
const s = defaultScenario({ room, source: { x_m: 2, y_m: 2, z_m: 0.9 }, worker: { x_m: 2, y_m: 1.4, z_m: 1.5 } });

describe('the jet the form starts from', () => {
  it('aims at the breathing zone in azimuth and tilt: 270° and 45° for a worker 0.6 m off and 0.6 m up [C]', () => {
    const a = breathingZoneAngles(s);
    expect(a.azimuth_deg).toBeCloseTo(270, 9);
    expect(a.elevation_deg).toBeCloseTo(45, 9);
  });

  it('starts from the release type\'s default jet so nothing jumps when "use the default" is unticked', () => {
    expect(jetToEdit(withReleaseType(s, 'high'))).toMatchObject({ speed_mPerS: 5, diameter_m: 0.05 });
    expect(jetToEdit(withReleaseType(s, 'quiet')).speed_mPerS).toBe(0);
  });
});
