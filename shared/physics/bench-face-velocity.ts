import type { CaptureVelocityRange } from './capture-velocity';

type Point = { x_m: number; y_m: number; z_m: number };
/** A bench as the scenario holds it: face centre on the work surface, faceWidth_m its length along x, faceHeight_m its depth along y. */
export type Bench = Point & { faceWidth_m: number; faceHeight_m: number; airflow_m3PerS: number };

/**
 * [P] common practice, no published source: a downdraft bench is designed for a face velocity of
 * 0.5–1.0 m/s averaged over its open work surface. Confirm against local guidance.
 */
export const BENCH_FACE_VELOCITY: CaptureVelocityRange = {
  min_mPerS: 0.5,
  max_mPerS: 1.0,
  description: 'Face velocity averaged over the open work surface of a downdraft bench (common practice; confirm against local guidance)',
  examples: ['sanding a panel on the bench', 'hand-finishing small parts'],
};

/**
 * [P] a judgement, not a published figure: by the flanged-opening centre-line equation the air 0.3 m above a
 * 1 m × 0.6 m work surface already moves at about half the face velocity, so higher up the face velocity no
 * longer describes the air at the source.
 */
export const BENCH_REACH_ABOVE_m = 0.3;

// A source placed exactly on the outline or at the reach counts as over the surface, whatever the rounding.
const EDGE_m = 1e-9;

export interface BenchFaceCheck {
  /** Q/A over the work surface. */
  faceVelocity_mPerS: number;
  /** Height of the source above the work surface (negative below it). */
  height_m: number;
  /** The source lies within the outline in plan and from 0 to BENCH_REACH_ABOVE_m above the surface. */
  overSurface: boolean;
}

// Face velocity V = Q/A over the whole open surface (the booth/face-velocity form of the ACGIH hood equations).
export function benchFaceCheck(bench: Bench, source: Point): BenchFaceCheck {
  const height_m = source.z_m - bench.z_m;
  const overSurface =
    Math.abs(source.x_m - bench.x_m) <= bench.faceWidth_m / 2 + EDGE_m &&
    Math.abs(source.y_m - bench.y_m) <= bench.faceHeight_m / 2 + EDGE_m &&
    height_m >= -EDGE_m &&
    height_m <= BENCH_REACH_ABOVE_m + EDGE_m;
  return { faceVelocity_mPerS: bench.airflow_m3PerS / (bench.faceWidth_m * bench.faceHeight_m), height_m, overSurface };
}
