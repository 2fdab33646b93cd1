import type { ScenarioInput } from '../../../../shared/schemas/scenario';
import { cubicMetresPerHourToPerSecond } from '../../../../shared/units';
import { azimuthToward, type HoodInput } from './hood-axis';
import { snapInside } from './snap';

const STANDOFF_m = 0.3;

// A new hood goes behind the source, away from the worker, facing the source: dust is drawn away from the face.
export function newHood(s: ScenarioInput): HoodInput {
  const { source, worker, room } = s;
  const dx = source.x_m - worker.x_m;
  const dy = source.y_m - worker.y_m;
  const d = Math.hypot(dx, dy);
  const [ux, uy] = d > 1e-6 ? [dx / d, dy / d] : [1, 0];
  const at = {
    x_m: snapInside(source.x_m + STANDOFF_m * ux, room.length_m),
    y_m: snapInside(source.y_m + STANDOFF_m * uy, room.width_m),
    z_m: snapInside(source.z_m, room.height_m),
  };
  return {
    kind: 'flanged',
    ...at,
    direction: { azimuth_deg: Math.round(azimuthToward(at, source)), elevation_deg: 0 },
    faceWidth_m: 0.3,
    faceHeight_m: 0.2,
    airflow_m3PerS: cubicMetresPerHourToPerSecond(800),
  };
}
