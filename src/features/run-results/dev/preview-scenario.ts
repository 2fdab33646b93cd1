import type { ScenarioInput } from '../../../../shared/schemas/scenario';

// The workspace test fixture's scenario with enough particles for a readable picture.
export const PREVIEW_SCENARIO: ScenarioInput = {
  name: 'Preview bench',
  room: { length_m: 8, width_m: 6, height_m: 3, airChanges_perH: 4, draftSpeed_mPerS: 0.1, draftDirection_deg: 0 },
  source: {
    x_m: 2,
    y_m: 3,
    z_m: 0.9,
    emission: { kind: 'continuous', rate_mgPerMin: 5, taskDuration_min: 10 },
    taskMinutesPerShift: 240,
    releaseType: 'active',
  },
  dust: {
    name: 'Test quartz',
    density_kgPerM3: 2650,
    shapeFactor: 1.2,
    sizeProfile: { kind: 'lognormal', basis: 'mmad', median_m: 5e-6, gsd: 2 },
  },
  hoods: [
    {
      kind: 'flanged',
      x_m: 1.7,
      y_m: 3,
      z_m: 0.9,
      direction: { x: 1, y: 0, z: 0 },
      faceWidth_m: 0.3,
      faceHeight_m: 0.3,
      airflow_m3PerS: 0.3,
    },
  ],
  worker: { x_m: 2.5, y_m: 3, z_m: 1.5 },
  limit: { fraction: 'respirable', value_mgPerM3: 0.025, source: 'ACGIH TLV' },
  run: { particles: 3000, seed: 7, batches: 4 },
};
