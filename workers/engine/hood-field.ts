import type { Hood } from '../../shared/schemas/scenario.ts';
import { hoodAxis } from '../../shared/schemas/hood-axis.ts';

export const HOOD_STRIDE = 22;
export const HOOD_KINDS = ['plain', 'flanged', 'slot', 'flanged-slot', 'booth'] as const;
/** A particle that crosses the face plane within the face outline and less than this behind it is captured. */
export const CAPTURE_DEPTH_m = 0.1;
const COEFFICIENT = [1, 0.75, 3.7, 2.6, 0.75];

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
    p.set(
      [kind, hood.x_m, hood.y_m, hood.z_m, nx, ny, nz, e1x, e1y, e1z,
        ny * e1z - nz * e1y, nz * e1x - nx * e1z, nx * e1y - ny * e1x,
        hood.faceWidth_m / 2, hood.faceHeight_m / 2, hood.airflow_m3PerS, area, COEFFICIENT[kind],
        hood.airflow_m3PerS / area, hood.faceWidth_m,
        kind === 2 || kind === 3 ? hood.faceHeight_m / 2 : Math.hypot(hood.faceWidth_m, hood.faceHeight_m) / 2,
        Math.min(hood.faceWidth_m, hood.faceHeight_m) / 2],
      o,
    );
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
    const kind = p[o];
    const rx = x - p[o + 1];
    const ry = y - p[o + 2];
    const rz = z - p[o + 3];
    const a = rx * p[o + 4] + ry * p[o + 5] + rz * p[o + 6];
    const u = rx * p[o + 7] + ry * p[o + 8] + rz * p[o + 9];
    const v = rx * p[o + 10] + ry * p[o + 11] + rz * p[o + 12];
    const hw = p[o + 13];
    const hh = p[o + 14];
    const au = Math.abs(u);
    const av = Math.abs(v);
    const onFace = au <= hw && av <= hh;
    if (onFace && a <= 0 && a > -CAPTURE_DEPTH_m) return h;
    const slot = kind === 2 || kind === 3;
    let sx = rx;
    let sy = ry;
    let sz = rz;
    if (slot) {
      const along = u > hw ? hw : u < -hw ? -hw : u;
      sx -= along * p[o + 7];
      sy -= along * p[o + 8];
      sz -= along * p[o + 9];
    }
    const s2 = sx * sx + sy * sy + sz * sz;
    const r = Math.sqrt(s2);
    // A lower bound on the distance to the face outline is all the step rule needs, and it
    // reuses r: the outline lies within its half-diagonal (slot: half-width) of the centre (line).
    const aa = a < 0 ? -a : a;
    const bound = r - p[o + 20];
    const face = bound > aa ? bound : aa;
    if (face < nearest) {
      nearest = face;
      out[4] = h;
      out[5] = onFace ? a : -1;
    }
    const q = p[o + 15];
    if (q === 0 || r === 0) continue;
    if (kind === 4 && a >= 0 && onFace && a <= p[o + 21]) {
      const vf = p[o + 18];
      out[0] -= vf * p[o + 4];
      out[1] -= vf * p[o + 5];
      out[2] -= vf * p[o + 6];
      continue;
    }
    const flanged = kind === 1 || kind === 3 || kind === 4;
    if (flanged && a <= 0) continue;
    const area = p[o + 16];
    let resistance = slot ? p[o + 17] * p[o + 19] * r : p[o + 17] * (10 * s2 + area);
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
