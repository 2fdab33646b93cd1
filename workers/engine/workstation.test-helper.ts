/** A small bench with a flanged hood, sized so the direction and step tests run in about a second. */
export const workstation = {
  room: { length_m: 6, width_m: 5, height_m: 3, airChanges_perH: 4, draftSpeed_mPerS: 0.1, eddyDiffusivity_m2PerS: undefined },
  source: { x_m: 2, y_m: 2.5, z_m: 0.9, emission: { kind: 'continuous', rate_mgPerMin: 5, taskDuration_min: 20 } },
  dust: { density_kgPerM3: 2650, sizeProfile: { kind: 'lognormal', basis: 'mmad', median_m: 6e-6, gsd: 2.2 } },
  hoods: [
    {
      kind: 'flanged',
      x_m: 2,
      y_m: 3.1,
      z_m: 0.95,
      direction: { azimuth_deg: -90 },
      faceWidth_m: 0.4,
      faceHeight_m: 0.3,
      airflow_m3PerS: 0.15,
    },
  ],
  worker: { x_m: 2.3, y_m: 2.0, z_m: 1.3 },
  run: { particles: 4000, batches: 8, seed: 21 },
};

export function withAirflow(airflow_m3PerS: number) {
  return { ...workstation, hoods: [{ ...workstation.hoods[0], airflow_m3PerS }] };
}
