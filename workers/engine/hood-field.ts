import type { Hood } from '../../shared/schemas/scenario';
import { hoodAxis } from '../../shared/schemas/hood-axis';
import * as fit from '../../shared/physics/hoods';
import * as slots from './hood-slots';

// Module-level copies rather than the imported bindings: V8 folds a module's own constants into
// the compiled loop, while each use of an import stays a load and a check (about twice the time
// of a literal offset in a small loop under tsx).
const { OPENING_DISTANCE_FACTOR } = fit;
const {
  HOOD_AIRFLOW,
  HOOD_AREA,
  HOOD_BOOTH_DEPTH,
  HOOD_COEFFICIENT,
  HOOD_E1X,
  HOOD_E1Y,
  HOOD_E1Z,
  HOOD_E2X,
  HOOD_E2Y,
  HOOD_E2Z,
  HOOD_FACE_VELOCITY,
  HOOD_HALF_HEIGHT,
  HOOD_HALF_WIDTH,
  HOOD_KIND,
  HOOD_NX,
  HOOD_NY,
  HOOD_NZ,
  HOOD_REACH,
  HOOD_STRIDE,
  HOOD_WIDTH,
  HOOD_X,
  HOOD_Y,
  HOOD_Z,
  KIND_BOOTH,
  KIND_FLANGED,
  KIND_FLANGED_SLOT,
  KIND_SLOT,
} = slots;

export { HOOD_STRIDE } from './hood-slots';
export const HOOD_KINDS = ['plain', 'flanged', 'slot', 'flanged-slot', 'booth'] as const;
/** A particle that crosses the face plane within the face outline and less than this behind it is captured. */
export const CAPTURE_DEPTH_m = 0.1;
// Beyond its straight-draw depth a booth acts as a flanged opening.
const COEFFICIENT = HOOD_KINDS.map((kind) => fit.HOOD_FIT_COEFFICIENT[kind === 'booth' ? 'flanged' : kind]);

// Width runs horizontally across the face (along the slot for slots); height completes the frame.
export function packHoods(hoods: readonly Hood[]): Float64Array {
  const p = new Float64Array(hoods.length * HOOD_STRIDE);
  hoods.forEach((hood, h) => {
    const o = h * HOOD_STRIDE;
    const [nx, ny, nz] = hoodAxis(hood.direction);
    let e1x = -ny;
    let e1y = nx;
    let e1z = 0;
    const l1 = Math.hypot(e1x, e1y);
    if (l1 < 1e-9) [e1x, e1y, e1z] = [1, 0, 0];
    else [e1x, e1y] = [e1x / l1, e1y / l1];
    const kind = HOOD_KINDS.indexOf(hood.kind);
    const area = hood.faceWidth_m * hood.faceHeight_m;
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
    p[o + HOOD_COEFFICIENT] = COEFFICIENT[kind];
    p[o + HOOD_FACE_VELOCITY] = hood.airflow_m3PerS / area;
    p[o + HOOD_WIDTH] = hood.faceWidth_m;
    p[o + HOOD_REACH] =
      kind === KIND_SLOT || kind === KIND_FLANGED_SLOT ? hood.faceHeight_m / 2 : Math.hypot(hood.faceWidth_m, hood.faceHeight_m) / 2;
    p[o + HOOD_BOOTH_DEPTH] = Math.min(hood.faceWidth_m, hood.faceHeight_m) / 2;
  });
  return p;
}

/**
 * Sink model (an engineering approximation): air moves toward the face centre (for slots, the
 * nearest point of the slot line) with the published centre-line speed at the particle's distance,
 * never above the face velocity Q/A. Flanged faces draw nothing from behind their plane; plain
 * openings and slots are scaled by (1 + cos θ)/2, which is 1 on the axis. A booth draws straight in
 * at face velocity within its outline up to half its smaller face dimension in front, and acts as a
 * flanged opening beyond. Adds the velocity into out[0..2], writes the distance to the nearest face
 * outline (a lower bound) into out[3], that hood's index into out[4] and the particle's height above its face plane
 * into out[5] (negative when outside the face outline), and returns the index of a hood whose face
 * the particle has reached, or −1.
 */
export function evaluateHoods(p: Float64Array, count: number, x: number, y: number, z: number, out: Float64Array): number {
  let nearest = Infinity;
  for (let h = 0; h < count; h++) {
    const o = h * HOOD_STRIDE;
    const kind = p[o + HOOD_KIND];
    const rx = x - p[o + HOOD_X];
    const ry = y - p[o + HOOD_Y];
    const rz = z - p[o + HOOD_Z];
    const a = rx * p[o + HOOD_NX] + ry * p[o + HOOD_NY] + rz * p[o + HOOD_NZ];
    const u = rx * p[o + HOOD_E1X] + ry * p[o + HOOD_E1Y] + rz * p[o + HOOD_E1Z];
    const v = rx * p[o + HOOD_E2X] + ry * p[o + HOOD_E2Y] + rz * p[o + HOOD_E2Z];
    const hw = p[o + HOOD_HALF_WIDTH];
    const hh = p[o + HOOD_HALF_HEIGHT];
    const au = Math.abs(u);
    const av = Math.abs(v);
    const onFace = au <= hw && av <= hh;
    if (onFace && a <= 0 && a > -CAPTURE_DEPTH_m) return h;
    const slot = kind === KIND_SLOT || kind === KIND_FLANGED_SLOT;
    let sx = rx;
    let sy = ry;
    let sz = rz;
    if (slot) {
      const along = u > hw ? hw : u < -hw ? -hw : u;
      sx -= along * p[o + HOOD_E1X];
      sy -= along * p[o + HOOD_E1Y];
      sz -= along * p[o + HOOD_E1Z];
    }
    const s2 = sx * sx + sy * sy + sz * sz;
    const r = Math.sqrt(s2);
    // A lower bound on the distance to the face outline is all the step rule needs, and it
    // reuses r: the outline lies within its half-diagonal (slot: half-width) of the centre (line).
    const aa = a < 0 ? -a : a;
    const bound = r - p[o + HOOD_REACH];
    const face = bound > aa ? bound : aa;
    if (face < nearest) {
      nearest = face;
      out[4] = h;
      out[5] = onFace ? a : -1;
    }
    const q = p[o + HOOD_AIRFLOW];
    if (q === 0 || r === 0) continue;
    if (kind === KIND_BOOTH && a >= 0 && onFace && a <= p[o + HOOD_BOOTH_DEPTH]) {
      const vf = p[o + HOOD_FACE_VELOCITY];
      out[0] -= vf * p[o + HOOD_NX];
      out[1] -= vf * p[o + HOOD_NY];
      out[2] -= vf * p[o + HOOD_NZ];
      continue;
    }
    const flanged = kind === KIND_FLANGED || kind === KIND_FLANGED_SLOT || kind === KIND_BOOTH;
    if (flanged && a <= 0) continue;
    const area = p[o + HOOD_AREA];
    let resistance = slot
      ? p[o + HOOD_COEFFICIENT] * p[o + HOOD_WIDTH] * r
      : p[o + HOOD_COEFFICIENT] * (OPENING_DISTANCE_FACTOR * s2 + area);
    if (resistance < area) resistance = area;
    // q/(R·r), times (1 + cos θ)/2 = (r + a)/(2r) off a plain face, written as q·r/(R·r²) so the
    // division does not wait for the square root.
    const k2 = q / (resistance * s2);
    const scale = flanged ? k2 * r : 0.5 * k2 * (r + a);
    out[0] -= scale * sx;
    out[1] -= scale * sy;
    out[2] -= scale * sz;
  }
  out[3] = nearest;
  return -1;
}
