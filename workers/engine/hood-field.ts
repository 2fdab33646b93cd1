import { scratchFloat64 } from '../../shared/det-math/scratch';
import type { Hood } from '../../shared/schemas/scenario';
import { hoodAxis } from '../../shared/schemas/hood-axis';
import { sinkPanelVelocityAt } from '../../shared/physics/sink-panel';
import * as slots from './hood-slots';
import { hypot3 } from '../../shared/det-math/index';

// Module-level copies rather than the imported bindings: V8 folds a module's own constants into
// the compiled loop, while each use of an import stays a load and a check.
const {
  HOOD_AIRFLOW,
  HOOD_AREA,
  HOOD_E1X,
  HOOD_E1Y,
  HOOD_E1Z,
  HOOD_E2X,
  HOOD_E2Y,
  HOOD_E2Z,
  HOOD_FACE_VELOCITY,
  HOOD_FAR2,
  HOOD_FRONT_SHARE,
  HOOD_HALF_HEIGHT,
  HOOD_HALF_WIDTH,
  HOOD_KIND,
  HOOD_NX,
  HOOD_NY,
  HOOD_NZ,
  HOOD_REACH,
  HOOD_STRIDE,
  HOOD_X,
  HOOD_Y,
  HOOD_Z,
  KIND_PLAIN,
  KIND_SLOT,
} = slots;

export { HOOD_STRIDE } from './hood-slots';
export const HOOD_KINDS = ['plain', 'flanged', 'slot', 'flanged-slot', 'booth', 'downdraft-bench'] as const;
/** The step rule's floor on the distance to a face: the field is resolved to within a few centimetres. */
export const FACE_RESOLUTION_m = 0.05;
// A flange saves a quarter of the airflow for the same centre-line speed (ACGIH hood-types figure),
// so an unflanged face draws three quarters from the front (shared/physics/hood-face.ts).
const UNFLANGED_FRONT_SHARE = 0.75;
// The face rectangle's quadrupole term has fallen below 1 % of the point sink's at eight half-diagonals.
const FAR_FIELD_HALF_DIAGONALS = 8;

const local = scratchFloat64(3);
// The sink panel's arguments (shared/physics/sink-panel.ts sinkPanelVelocityAt), a point, and a segment for the
// outline test: in arrays, since a double crossing a call V8 has not inlined is a heap allocation, and these run at
// every step.
const panel = scratchFloat64(7);
const point = scratchFloat64(3);
const crossing = scratchFloat64(7);
const segment = scratchFloat64(6);
// Infinity as a double: a minimum started from the global Infinity is kept tagged, and each new minimum boxed.
const FAR = Float64Array.of(Infinity);

// Width runs horizontally across the face (along the slot for slots); height completes the frame. A downdraft
// bench, facing up (the schema sees to that), packs as a flanged face: width along +x, height (depth) along +y.
export function packHoods(hoods: readonly Hood[]): Float64Array {
  const p = new Float64Array(hoods.length * HOOD_STRIDE);
  hoods.forEach((hood, h) => {
    const o = h * HOOD_STRIDE;
    const [nx, ny, nz] = hoodAxis(hood.direction);
    let e1x = -ny;
    let e1y = nx;
    let e1z = 0;
    const l1 = hypot3(e1x, e1y);
    if (l1 < 1e-9) [e1x, e1y, e1z] = [1, 0, 0];
    else [e1x, e1y] = [e1x / l1, e1y / l1];
    const kind = HOOD_KINDS.indexOf(hood.kind);
    const area = hood.faceWidth_m * hood.faceHeight_m;
    const reach = hypot3(hood.faceWidth_m, hood.faceHeight_m) / 2;
    p[o + HOOD_KIND] = kind;
    p[o + HOOD_X] = hood.x_m;
    p[o + HOOD_Y] = hood.y_m;
    p[o + HOOD_Z] = hood.z_m;
    p[o + HOOD_NX] = nx;
    p[o + HOOD_NY] = ny;
    p[o + HOOD_NZ] = nz;
    p[o + HOOD_E1X] = e1x;
    p[o + HOOD_E1Y] = e1y;
    p[o + HOOD_E1Z] = e1z;
    p[o + HOOD_E2X] = ny * e1z - nz * e1y;
    p[o + HOOD_E2Y] = nz * e1x - nx * e1z;
    p[o + HOOD_E2Z] = nx * e1y - ny * e1x;
    p[o + HOOD_HALF_WIDTH] = hood.faceWidth_m / 2;
    p[o + HOOD_HALF_HEIGHT] = hood.faceHeight_m / 2;
    p[o + HOOD_AIRFLOW] = hood.airflow_m3PerS;
    p[o + HOOD_AREA] = area;
    p[o + HOOD_FRONT_SHARE] = kind === KIND_PLAIN || kind === KIND_SLOT ? UNFLANGED_FRONT_SHARE : 1;
    p[o + HOOD_FACE_VELOCITY] = hood.airflow_m3PerS / area;
    p[o + HOOD_REACH] = reach;
    p[o + HOOD_FAR2] = FAR_FIELD_HALF_DIAGONALS * reach * (FAR_FIELD_HALF_DIAGONALS * reach);
  });
  return p;
}

/**
 * Every face draws uniformly over its rectangle: the constant-strength sink panel of
 * shared/physics/sink-panel.ts (closed form), so the field carries the hood's airflow through any
 * surface around the face and meets it at Q/A; beyond eight half-diagonals the panel is a point
 * sink of the same strength per side. Adds the velocity into out[0..2] and writes a lower bound on
 * the distance to the nearest face outline into out[3]. Allocation-free, for the step loop.
 */
export function addHoodVelocity(p: Float64Array, count: number, x: number, y: number, z: number, out: Float64Array): void {
  point.set([x, y, z]);
  addHoodVelocityAt(p, count, point, out);
}

/** addHoodVelocity at the point at[0..2]: the step loop's allocation-free form. */
export function addHoodVelocityAt(p: Float64Array, count: number, at: Float64Array, out: Float64Array): void {
  const x = at[0];
  const y = at[1];
  const z = at[2];
  let nearest = FAR[0];
  for (let h = 0; h < count; h++) {
    const o = h * HOOD_STRIDE;
    const rx = x - p[o + HOOD_X];
    const ry = y - p[o + HOOD_Y];
    const rz = z - p[o + HOOD_Z];
    const a = rx * p[o + HOOD_NX] + ry * p[o + HOOD_NY] + rz * p[o + HOOD_NZ];
    const r2 = rx * rx + ry * ry + rz * rz;
    const r = Math.sqrt(r2);
    // The outline lies within its half-diagonal of the centre, and never nearer than the face plane.
    const aa = a < 0 ? -a : a;
    const bound = r - p[o + HOOD_REACH];
    const face = bound > aa ? bound : aa;
    if (face < nearest) nearest = face;
    const q = p[o + HOOD_AIRFLOW];
    if (q === 0) continue;
    const front = p[o + HOOD_FRONT_SHARE];
    const side = a >= 0 ? front : 1 - front;
    if (side === 0) continue;
    if (r2 > p[o + HOOD_FAR2]) {
      const k = (-side * q) / (2 * Math.PI * r2 * r);
      out[0] += k * rx;
      out[1] += k * ry;
      out[2] += k * rz;
      continue;
    }
    panel[0] = rx * p[o + HOOD_E1X] + ry * p[o + HOOD_E1Y] + rz * p[o + HOOD_E1Z];
    panel[1] = rx * p[o + HOOD_E2X] + ry * p[o + HOOD_E2Y] + rz * p[o + HOOD_E2Z];
    panel[2] = a;
    panel[3] = p[o + HOOD_HALF_WIDTH];
    panel[4] = p[o + HOOD_HALF_HEIGHT];
    panel[5] = q;
    panel[6] = front;
    sinkPanelVelocityAt(panel, local);
    out[0] += local[0] * p[o + HOOD_E1X] + local[1] * p[o + HOOD_E2X] + local[2] * p[o + HOOD_NX];
    out[1] += local[0] * p[o + HOOD_E1Y] + local[1] * p[o + HOOD_E2Y] + local[2] * p[o + HOOD_NY];
    out[2] += local[0] * p[o + HOOD_E1Z] + local[1] * p[o + HOOD_E2Z] + local[2] * p[o + HOOD_NZ];
  }
  out[3] = nearest;
}

/**
 * The hood whose face the segment from (x, y, z) by (dx, dy, dz) passes through inside its outline
 * in the direction the face draws (from the front always; from behind too where an unflanged face
 * draws part of its air), or −1. The walk asks it of the drift alone: only moving air carries a
 * particle into a hood, so a face that draws nothing captures nothing.
 */
export function faceEntered(p: Float64Array, count: number, x: number, y: number, z: number, dx: number, dy: number, dz: number): number {
  segment.set([x, y, z, dx, dy, dz]);
  return faceEnteredAt(p, count, segment);
}

/** faceEntered for the segment seg[0..2] by seg[3..5]: the step loop's allocation-free form. */
export function faceEnteredAt(p: Float64Array, count: number, seg: Float64Array): number {
  const x = seg[0];
  const y = seg[1];
  const z = seg[2];
  const dx = seg[3];
  const dy = seg[4];
  const dz = seg[5];
  for (let h = 0; h < count; h++) {
    const o = h * HOOD_STRIDE;
    if (p[o + HOOD_AIRFLOW] === 0) continue;
    const nx = p[o + HOOD_NX];
    const ny = p[o + HOOD_NY];
    const nz = p[o + HOOD_NZ];
    const a0 = (x - p[o + HOOD_X]) * nx + (y - p[o + HOOD_Y]) * ny + (z - p[o + HOOD_Z]) * nz;
    const a1 = a0 + dx * nx + dy * ny + dz * nz;
    const fromFront = a0 > 0 && a1 <= 0;
    const fromBehind = a0 < 0 && a1 >= 0 && p[o + HOOD_FRONT_SHARE] < 1;
    if (!(fromFront || fromBehind)) continue;
    crossing[0] = x;
    crossing[1] = y;
    crossing[2] = z;
    crossing[3] = dx;
    crossing[4] = dy;
    crossing[5] = dz;
    crossing[6] = a0 / (a0 - a1);
    if (throughOutline(p, o)) return h;
  }
  return -1;
}

/**
 * Reflects the random part of a step at every face it passes through inside the outline, as the
 * walk reflects it at the floor: diffusion alone never takes a particle into a hood. Moves the end
 * point (x1, y1, z1) in out[0..2] and returns 1 when a face reflected it.
 */
export function reflectAtFaces(
  p: Float64Array,
  count: number,
  x0: number,
  y0: number,
  z0: number,
  x1: number,
  y1: number,
  z1: number,
  out: Float64Array,
): number {
  segment.set([x0, y0, z0, x1, y1, z1]);
  return reflectAtFacesAt(p, count, segment, out);
}

/** reflectAtFaces from seg[0..2] to seg[3..5]: the step loop's allocation-free form. */
export function reflectAtFacesAt(p: Float64Array, count: number, seg: Float64Array, out: Float64Array): number {
  const x0 = seg[0];
  const y0 = seg[1];
  const z0 = seg[2];
  let x1 = seg[3];
  let y1 = seg[4];
  let z1 = seg[5];
  let reflected = 0;
  for (let h = 0; h < count; h++) {
    const o = h * HOOD_STRIDE;
    const nx = p[o + HOOD_NX];
    const ny = p[o + HOOD_NY];
    const nz = p[o + HOOD_NZ];
    const a0 = (x0 - p[o + HOOD_X]) * nx + (y0 - p[o + HOOD_Y]) * ny + (z0 - p[o + HOOD_Z]) * nz;
    const a1 = (x1 - p[o + HOOD_X]) * nx + (y1 - p[o + HOOD_Y]) * ny + (z1 - p[o + HOOD_Z]) * nz;
    if (a0 === 0 || a0 * a1 > 0) continue;
    crossing[0] = x0;
    crossing[1] = y0;
    crossing[2] = z0;
    crossing[3] = x1 - x0;
    crossing[4] = y1 - y0;
    crossing[5] = z1 - z0;
    crossing[6] = a0 / (a0 - a1);
    if (!throughOutline(p, o)) continue;
    // Mirror the end point in the face plane, leaving it a hair on the starting side.
    const shift = -2 * a1 + (a0 > 0 ? 1e-9 : -1e-9);
    x1 += shift * nx;
    y1 += shift * ny;
    z1 += shift * nz;
    reflected = 1;
  }
  out[0] = x1;
  out[1] = y1;
  out[2] = z1;
  return reflected;
}

// Whether the segment in crossing (start [0..2], step [3..5]) meets hood o's face plane, at the share crossing[6] of
// its step, inside the outline.
function throughOutline(p: Float64Array, o: number): boolean {
  const f = crossing[6];
  const cx = crossing[0] + f * crossing[3] - p[o + HOOD_X];
  const cy = crossing[1] + f * crossing[4] - p[o + HOOD_Y];
  const cz = crossing[2] + f * crossing[5] - p[o + HOOD_Z];
  const u = cx * p[o + HOOD_E1X] + cy * p[o + HOOD_E1Y] + cz * p[o + HOOD_E1Z];
  const v = cx * p[o + HOOD_E2X] + cy * p[o + HOOD_E2Y] + cz * p[o + HOOD_E2Z];
  return (u < 0 ? -u : u) <= p[o + HOOD_HALF_WIDTH] && (v < 0 ? -v : v) <= p[o + HOOD_HALF_HEIGHT];
}

/** Face velocity Q/A of hood h, for maps that show a face by what it draws. */
export function faceVelocity(p: Float64Array, h: number): number {
  return p[h * HOOD_STRIDE + HOOD_FACE_VELOCITY];
}
