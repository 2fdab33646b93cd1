import { scratchFloat64 } from '../det-math/scratch';
import * as det from '../det-math/index';

// Local copies of the deterministic functions this hot path calls (a module runner may read imports through getters),
// in their array forms: no double crosses a call (det-math/words.ts IO).
const atan2IO = det.atan2IO;
const logIO = det.logIO;
const IO = det.IO;

// Velocity of a uniformly drawing rectangular face: the field of a constant-strength sink sheet,
// u = −(σ/4π)∬(P − P')/|P − P'|³ dA' in closed form (log and atan terms at the four corners).
// Face in the plane z = 0, centred on the origin, half-widths along x and y; the room is z > 0.
// The free sheet draws half its airflow from each side; a flange is an image plane that doubles
// the field in front and leaves none behind. frontShare (½ to 1) is the share drawn from the front:
// the field is 2·frontShare times the free sheet's in front and 2·(1 − frontShare) times behind,
// so any share carries Q through every surface that encloses the face.

const ARGS = scratchFloat64(7);

// Writes the air velocity (m/s) at (x, y, z) into out[0..2]; no allocation, for the step loop.
export function sinkPanelVelocity(
  x_m: number,
  y_m: number,
  z_m: number,
  halfWidth_m: number,
  halfHeight_m: number,
  airflow_m3PerS: number,
  frontShare: number,
  out: Float64Array,
): void {
  ARGS.set([x_m, y_m, z_m, halfWidth_m, halfHeight_m, airflow_m3PerS, frontShare]);
  sinkPanelVelocityAt(ARGS, out);
}

/**
 * sinkPanelVelocity with its arguments in args[0..6] (x, y, z, half-width, half-height, airflow, front share): the
 * step loop's form, where a double crossing a call V8 has not inlined is a heap allocation.
 */
export function sinkPanelVelocityAt(args: Float64Array, out: Float64Array): void {
  const x_m = args[0];
  const y_m = args[1];
  const z_m = args[2];
  const halfWidth_m = args[3];
  const halfHeight_m = args[4];
  const airflow_m3PerS = args[5];
  const frontShare = args[6];
  const s2 = halfWidth_m - x_m;
  const s1 = -halfWidth_m - x_m;
  const t2 = halfHeight_m - y_m;
  const t1 = -halfHeight_m - y_m;
  const zz = z_m * z_m;
  const r22 = Math.sqrt(s2 * s2 + t2 * t2 + zz);
  const r12 = Math.sqrt(s1 * s1 + t2 * t2 + zz);
  const r21 = Math.sqrt(s2 * s2 + t1 * t1 + zz);
  const r11 = Math.sqrt(s1 * s1 + t1 * t1 + zz);
  const side = z_m >= 0 ? frontShare : 1 - frontShare;
  const c = (-2 * side * airflow_m3PerS) / (16 * Math.PI * halfWidth_m * halfHeight_m);
  // ln((t2 + R2)/(t1 + R1)) without the cancellation of t + R when t ≪ 0: (t + R)(R − t) = s² + z².
  const tFirst = t1 + t2 >= 0;
  const sFirst = s1 + s2 >= 0;
  IO[0] = (tFirst ? (t2 + r22) / (t1 + r21) : (r21 - t1) / (r22 - t2)) / (tFirst ? (t2 + r12) / (t1 + r11) : (r11 - t1) / (r12 - t2));
  logIO();
  const ux = IO[0];
  IO[0] = (sFirst ? (s2 + r22) / (s1 + r12) : (r12 - s1) / (r22 - s2)) / (sFirst ? (s2 + r21) / (s1 + r11) : (r11 - s1) / (r21 - s2));
  logIO();
  const uy = IO[0];
  // atan(p₁/q₁) + atan(p₂/q₂) = atan2(p₁q₂ + p₂q₁, q₁q₂ − p₁p₂) for q > 0: two atan2 for four atan.
  const za = z_m >= 0 ? z_m : -z_m;
  const q22 = za * r22;
  const q11 = za * r11;
  const q12 = za * r12;
  const q21 = za * r21;
  const p22 = s2 * t2;
  const p11 = s1 * t1;
  const p12 = s1 * t2;
  const p21 = s2 * t1;
  IO[0] = p22 * q11 + p11 * q22;
  IO[1] = q22 * q11 - p22 * p11;
  atan2IO();
  const first = IO[0];
  IO[0] = p12 * q21 + p21 * q12;
  IO[1] = q12 * q21 - p12 * p21;
  atan2IO();
  const solid = first - IO[0];
  const uz = z_m >= 0 ? solid : -solid;
  out[0] = c * ux;
  out[1] = c * uy;
  out[2] = c * uz;
}
