/** Fixed-seed benchmark workstation: a flanged hood, a cross-draft and a breathing zone, as in real use (npm run bench; the browser's warm-up pieces, workers/warm-up-pieces.ts, start from it). */
export const referenceScenario = {
  name: 'Benchmark reference bench',
  room: { length_m: 6, width_m: 5, height_m: 3, airChanges_perH: 4, draftSpeed_mPerS: 0.1 },
  source: { x_m: 2, y_m: 2.5, z_m: 0.9, emission: { kind: 'continuous', rate_mgPerMin: 5, taskDuration_min: 60 } },
  dust: { density_kgPerM3: 2650, sizeProfile: { kind: 'lognormal', basis: 'mmad', median_m: 6e-6, gsd: 2.2 } },
  hoods: [
    {
      kind: 'flanged',
      x_m: 2,
      y_m: 3.2,
      z_m: 0.95,
      direction: { azimuth_deg: -90 },
      faceWidth_m: 0.4,
      faceHeight_m: 0.3,
      airflow_m3PerS: 0.15,
    },
  ],
  worker: { x_m: 2.3, y_m: 2.0, z_m: 1.4 },
  run: { particles: 48000, batches: 12, seed: 1 },
};
