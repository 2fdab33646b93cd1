import { hoodAxis as axis } from '../../../../shared/schemas/hood-axis';
import type { ScenarioInput } from '../../../../shared/schemas/scenario';

export type HoodInput = NonNullable<ScenarioInput['hoods']>[number];
export type Direction = HoodInput['direction'];
export type Vec3 = { x: number; y: number; z: number };

const RAD = Math.PI / 180;

// The shared convention, as an object for the drawing code.
export function hoodAxis(direction: Direction): Vec3 {
  const [x, y, z] = axis(direction);
  return { x, y, z };
}

// The form edits azimuth and tilt only, so a stored vector is shown (and rewritten) in that form.
export function hoodAngles(direction: Direction): { azimuth_deg: number; tilt_deg: number } {
  if (!('x' in direction)) return { azimuth_deg: direction.azimuth_deg, tilt_deg: direction.elevation_deg ?? 0 };
  const n = hoodAxis(direction);
  const azimuth_deg = Math.abs(n.x) < 1e-12 && Math.abs(n.y) < 1e-12 ? 0 : Math.atan2(n.y, n.x) / RAD;
  return { azimuth_deg: (azimuth_deg + 360) % 360, tilt_deg: Math.asin(Math.max(-1, Math.min(1, n.z))) / RAD };
}

// Width runs horizontally across the face, as the engine packs it; height completes the frame.
export function faceFrame(direction: Direction): { n: Vec3; across: Vec3; up: Vec3 } {
  const n = hoodAxis(direction);
  const l = Math.hypot(n.x, n.y);
  const across = l < 1e-9 ? { x: 1, y: 0, z: 0 } : { x: -n.y / l, y: n.x / l, z: 0 };
  const up = { x: n.y * across.z - n.z * across.y, y: n.z * across.x - n.x * across.z, z: n.x * across.y - n.y * across.x };
  return { n, across, up };
}

export function faceCorners(hood: HoodInput): Vec3[] {
  const { across, up } = faceFrame(hood.direction);
  const w = hood.faceWidth_m / 2;
  const h = hood.faceHeight_m / 2;
  return [
    [-w, -h],
    [w, -h],
    [w, h],
    [-w, h],
  ].map(([a, b]) => ({
    x: hood.x_m + a * across.x + b * up.x,
    y: hood.y_m + a * across.y + b * up.y,
    z: hood.z_m + a * across.z + b * up.z,
  }));
}

export function azimuthToward(from: { x_m: number; y_m: number }, to: { x_m: number; y_m: number }): number {
  const dx = to.x_m - from.x_m;
  const dy = to.y_m - from.y_m;
  if (Math.hypot(dx, dy) < 1e-9) return 0;
  return (Math.atan2(dy, dx) / RAD + 360) % 360;
}
