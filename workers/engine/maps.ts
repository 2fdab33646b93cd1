import { addHoodVelocity } from './hood-field';
import type { BatchResult, Grid, PreparedScenario, Results } from './types';

const MAP_CELLS = 40;

// Mean deposited mass per batch over the floor, per unit area.
export function depositionMap(p: PreparedScenario, batches: readonly BatchResult[]): Grid {
  const { nx, ny } = p.deposition;
  const cell: [number, number] = [p.room.length_m / nx, p.room.width_m / ny];
  const values = new Float32Array(nx * ny);
  for (const batch of batches) for (let i = 0; i < values.length; i++) values[i] += batch.deposition_mg[i];
  for (let i = 0; i < values.length; i++) values[i] /= batches.length * cell[0] * cell[1];
  return { nx, ny, cell_m: cell, origin_m: [0, 0], values };
}

// Air speed (hoods plus draft, no settling, no release jet) on a horizontal plane at source height.
export function captureVelocityMap(p: PreparedScenario): Results['maps']['captureVelocity_mPerS'] {
  const nx = MAP_CELLS;
  const ny = MAP_CELLS;
  const cell: [number, number] = [p.room.length_m / nx, p.room.width_m / ny];
  const values = new Float32Array(nx * ny);
  const field = new Float64Array(4);
  const z = p.source.z_m;
  for (let ix = 0; ix < nx; ix++) {
    for (let iy = 0; iy < ny; iy++) {
      field[0] = p.draft_mPerS[0];
      field[1] = p.draft_mPerS[1];
      field[2] = 0;
      addHoodVelocity(p.hoods.params, p.hoods.count, (ix + 0.5) * cell[0], (iy + 0.5) * cell[1], z, field);
      values[ix * ny + iy] = Math.hypot(field[0], field[1], field[2]);
    }
  }
  return { nx, ny, cell_m: cell, origin_m: [0, 0], values, height_m: z };
}
