import { parseScenario } from '../../../../shared/schemas/scenario';

// The stone-bench demo with its flanged hood 0.3 m from the source, facing −y.
export const stoneBench = () =>
  parseScenario({
    room: { length_m: 8, width_m: 6, height_m: 3.5, airChanges_perH: 3, draftSpeed_mPerS: 0.15, draftDirection_deg: 0 },
    source: {
      x_m: 3,
      y_m: 3,
      z_m: 0.92,
      shape: 'box',
      size_m: 0.1,
      emission: { kind: 'continuous', rate_mgPerMin: 20, taskDuration_min: 60 },
      taskMinutesPerShift: 240,
      background_mgPerM3: 0.002,
      releaseType: 'high',
    },
    dust: {
      name: 'Crystalline silica',
      density_kgPerM3: 2650,
      shapeFactor: 1.36,
      sizeProfile: { kind: 'lognormal', basis: 'mmad', median_m: 1e-5, gsd: 2.5 },
    },
    worker: { x_m: 3, y_m: 2.35, z_m: 1.5, radius_m: 0.3, posture: 'standing' },
    limit: { fraction: 'respirable', value_mgPerM3: 0.025, source: 'ACGIH TLV-TWA' },
    hoods: [
      {
        name: 'Flanged hood behind the workpiece',
        kind: 'flanged',
        x_m: 3,
        y_m: 3.3,
        z_m: 0.95,
        direction: { azimuth_deg: -90, elevation_deg: 0 },
        faceWidth_m: 0.35,
        faceHeight_m: 0.25,
        airflow_m3PerS: 0.35,
      },
    ],
    run: { particles: 40000, seed: 20240601, batches: 10 },
  });
