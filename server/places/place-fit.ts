import type { Issue } from '../lib/app-error';
import type { RoomData, WorkstationData } from '../../shared/schemas/workspace-views';

type Box = Pick<RoomData, 'length_m' | 'width_m' | 'height_m'>;

// The source and the worker's breathing zone must both lie inside the room they are drawn in.
export function pointsOutsideRoom(room: Box, data: Pick<WorkstationData, 'source' | 'worker'>, prefix = 'body.data'): Issue[] {
  const issues: Issue[] = [];
  for (const [part, point] of [
    ['source', data.source],
    ['worker', data.worker],
  ] as const) {
    if (point.x_m > room.length_m)
      issues.push({ path: `${prefix}.${part}.x_m`, message: `Must be within the room length (${room.length_m} m), got ${point.x_m}` });
    if (point.y_m > room.width_m)
      issues.push({ path: `${prefix}.${part}.y_m`, message: `Must be within the room width (${room.width_m} m), got ${point.y_m}` });
    if (point.z_m > room.height_m)
      issues.push({ path: `${prefix}.${part}.z_m`, message: `Must be below the ceiling (${room.height_m} m), got ${point.z_m}` });
  }
  return issues;
}
