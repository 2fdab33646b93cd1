import { addHoodVelocity } from './hood-field';
import { HOOD_STRIDE, HOOD_X, HOOD_Y } from './hood-slots';
import type { BatchResult, Grid, PreparedScenario, Results } from './types';
import { hypot3 } from '../../shared/det-math/index';

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

type CaptureGrid = Results['maps']['captureVelocity_mPerS'];

// Air speed (hoods plus draft, no settling, no release jet) on a horizontal plane at source height.
function captureGrid(p: PreparedScenario, x0: number, y0: number, x1: number, y1: number): CaptureGrid {
  const nx = MAP_CELLS;
  const ny = MAP_CELLS;
  const cell: [number, number] = [(x1 - x0) / nx, (y1 - y0) / ny];
  const values = new Float32Array(nx * ny);
  const field = new Float64Array(4);
  const z = p.source.z_m;
  for (let ix = 0; ix < nx; ix++) {
    for (let iy = 0; iy < ny; iy++) {
      field[0] = p.draft_mPerS[0];
      field[1] = p.draft_mPerS[1];
      field[2] = 0;
      addHoodVelocity(p.hoods.params, p.hoods.count, x0 + (ix + 0.5) * cell[0], y0 + (iy + 0.5) * cell[1], z, field);
      values[ix * ny + iy] = hypot3(field[0], field[1], field[2]);
    }
  }
  return { nx, ny, cell_m: cell, origin_m: [x0, y0], values, height_m: z };
}

export function captureVelocityMap(p: PreparedScenario): CaptureGrid {
  return captureGrid(p, 0, 0, p.room.length_m, p.room.width_m);
}

// Room to spare around the source, the hood centres and the breathing zone (common practice for a close-up).
const NEAR_PAD_m = 0.5;

/**
 * The same map over the workstation only: capture is decided in the few decimetres in front of a
 * face, which the whole-room map's cells (a fortieth of the room) blur. Absent without hoods.
 */
export function captureVelocityNearMap(p: PreparedScenario): CaptureGrid | undefined {
  if (p.hoods.count === 0) return undefined;
  const xs = [p.source.x_m, p.zone.x_m - p.zone.radius_m, p.zone.x_m + p.zone.radius_m];
  const ys = [p.source.y_m, p.zone.y_m - p.zone.radius_m, p.zone.y_m + p.zone.radius_m];
  for (let h = 0; h < p.hoods.count; h++) {
    xs.push(p.hoods.params[h * HOOD_STRIDE + HOOD_X]);
    ys.push(p.hoods.params[h * HOOD_STRIDE + HOOD_Y]);
  }
  const x0 = Math.max(0, Math.min(...xs) - NEAR_PAD_m);
  const x1 = Math.min(p.room.length_m, Math.max(...xs) + NEAR_PAD_m);
  const y0 = Math.max(0, Math.min(...ys) - NEAR_PAD_m);
  const y1 = Math.min(p.room.width_m, Math.max(...ys) + NEAR_PAD_m);
  return captureGrid(p, x0, y0, x1, y1);
}
