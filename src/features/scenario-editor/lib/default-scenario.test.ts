import { describe, expect, it } from 'vitest';
import { scenarioSchema } from '../../../../shared/schemas/scenario';
import { defaultScenario } from './default-scenario';
import { newHood } from './new-hood';

const args = {
  room: { length_m: 6, width_m: 4, height_m: 3, airChanges_perH: 4, draftSpeed_mPerS: 0.2, draftDirection_deg: 90, temperature_K: 293.15 },
  source: { x_m: 2, y_m: 2, z_m: 0.9 },
  worker: { x_m: 2.6, y_m: 2, z_m: 1.5 },
};

describe('defaultScenario', () => {
  it('parses with the scenario schema', () => {
    const result = scenarioSchema.safeParse(defaultScenario(args));
    expect(result.error?.issues ?? []).toEqual([]);
  });

  it('has no hoods, a continuous emission and a 5 µm / GSD 2 lognormal profile', () => {
    const s = defaultScenario(args);
    expect(s.hoods).toEqual([]);
    expect(s.source.emission.kind).toBe('continuous');
    expect(s.dust.sizeProfile).toMatchObject({ kind: 'lognormal', gsd: 2 });
    expect(s.dust.sizeProfile.kind === 'lognormal' && s.dust.sizeProfile.median_m).toBeCloseTo(5e-6, 12);
    expect(s.worker.posture).toBe('standing');
  });

  it('adds a new hood behind the source, away from the worker, facing the source', () => {
    const s = defaultScenario(args);
    const hood = newHood(s);
    expect(hood).toMatchObject({ x_m: 1.7, y_m: 2, z_m: 0.9, direction: { azimuth_deg: 0 } });
    expect(scenarioSchema.safeParse({ ...s, hoods: [hood] }).success).toBe(true);
  });

  it("takes the workstation's release type as the source's, and leaves it unset without one", () => {
    expect(defaultScenario({ ...args, releaseType: 'high' }).source.releaseType).toBe('high');
    expect(defaultScenario(args).source.releaseType).toBeUndefined();
  });
});
