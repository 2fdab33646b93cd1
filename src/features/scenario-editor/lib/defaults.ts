import { scenarioFields } from '../../../../shared/schemas/scenario';

const shape = scenarioFields;
const run = shape.run.unwrap().shape;

// Read from the schema itself so what the form shows for a blank field is what the server will store.
export const DEFAULTS = {
  airChanges_perH: shape.room.shape.airChanges_perH.parse(undefined),
  draftSpeed_mPerS: shape.room.shape.draftSpeed_mPerS.parse(undefined),
  draftDirection_deg: shape.room.shape.draftDirection_deg.parse(undefined),
  temperature_K: shape.room.shape.temperature_K.parse(undefined),
  shape: shape.source.shape.shape.parse(undefined),
  size_m: shape.source.shape.size_m.parse(undefined),
  background_mgPerM3: shape.source.shape.background_mgPerM3.parse(undefined),
  shapeFactor: shape.dust.shape.shapeFactor.parse(undefined),
  radius_m: shape.worker.shape.radius_m.parse(undefined),
  particles: run.particles.parse(undefined),
  seed: run.seed.parse(undefined),
  batches: run.batches.parse(undefined),
} as const;

export const POSTURE_HEIGHT_m = { standing: 1.5, seated: 1.1 } as const;
