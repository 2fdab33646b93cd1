import type { ReleaseType, ScenarioInput } from '../../../../shared/schemas/scenario';
import { micrometresToMetres } from '../../../../shared/units';

type Point = { x_m: number; y_m: number; z_m: number };

export interface DefaultScenarioArgs {
  room: Pick<ScenarioInput['room'], 'length_m' | 'width_m' | 'height_m'> &
    Required<Pick<ScenarioInput['room'], 'airChanges_perH' | 'draftSpeed_mPerS' | 'draftDirection_deg' | 'temperature_K'>>;
  source: Point;
  worker: Point;
  releaseType?: ReleaseType;
}

// A starting point for a new option: no controls, so the first run shows what the hood has to fix.
export function defaultScenario({ room, source, worker, releaseType }: DefaultScenarioArgs): ScenarioInput {
  return {
    room: { ...room },
    source: {
      ...source,
      shape: 'point',
      size_m: 0,
      // [P] common practice: a few mg/min is a typical light manual task such as scooping powder.
      emission: { kind: 'continuous', rate_mgPerMin: 5, taskDuration_min: 30 },
      background_mgPerM3: 0,
      ...(releaseType ? { releaseType } : {}),
    },
    dust: {
      density_kgPerM3: 2650,
      shapeFactor: 1,
      sizeProfile: { kind: 'lognormal', basis: 'mmad', median_m: micrometresToMetres(5), gsd: 2 },
    },
    hoods: [],
    worker: { ...worker, radius_m: 0.3, posture: worker.z_m < 1.3 ? 'seated' : 'standing' },
    run: { particles: 20000, seed: 1, batches: 10 },
  };
}
