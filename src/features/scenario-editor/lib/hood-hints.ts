import {
  captureVelocityRange,
  hoodCenterlineVelocity,
  hoodRequiredAirflow,
  type CaptureVelocityRange,
  type ReleaseCondition,
} from '../../../../shared/physics/index';
import { BENCH_FACE_VELOCITY, benchFaceCheck } from '../../../../shared/physics/bench-face-velocity';
import { isSlotKind } from '../../../../shared/vocabulary/index';
import { hoodAxis, type HoodInput } from './hood-axis';

// [M] the centre-line equations hold out to about 1.5 equivalent hood diameters.
const VALID_DIAMETERS = 1.5;
// [P] common practice: one slot draws reliably across about 0.5 m (the single-sided tank-width rule).
export const SLOT_REACH_m = 0.5;
// Half a percent of slack so a hood sized to exactly 1.00 m/s is not called "above" 1.0 by rounding.
const VERDICT_SLACK = 0.005;

export type CaptureVerdict = 'below' | 'within' | 'above';
export type ValidityRule = 'diameters' | 'slot' | 'booth';

export interface HoodHint {
  axial_m: number;
  offAxis_m: number;
  behind: boolean;
  centerline_mPerS: number | null;
  // Airflow that would bring the centre-line velocity at the source to the low end of the range.
  airflowForRange_m3PerS: number | null;
  /** Null while the source has no release type: there is no range to compare with. */
  range: CaptureVelocityRange | null;
  verdict: CaptureVerdict | null;
  faceVelocity_mPerS: number;
  rule: ValidityRule;
  validUpTo_m: number;
  beyondValidity: boolean;
  farOffAxis: boolean;
}

export const isSlot = isSlotKind;

export function captureVerdict(velocity_mPerS: number, range: CaptureVelocityRange): CaptureVerdict {
  if (velocity_mPerS < range.min_mPerS * (1 - VERDICT_SLACK)) return 'below';
  return velocity_mPerS > range.max_mPerS * (1 + VERDICT_SLACK) ? 'above' : 'within';
}

export function equivalentDiameter_m(faceArea_m2: number): number {
  return Math.sqrt((4 * faceArea_m2) / Math.PI);
}

const usable = (...values: number[]) => values.every(Number.isFinite);

// Null while the hood is half-entered: the physics functions rightly refuse a zero face or negative airflow.
export function hoodHint(
  hood: HoodInput,
  source: { x_m: number; y_m: number; z_m: number },
  release: ReleaseCondition | undefined,
): HoodHint | null {
  if (!usable(hood.x_m, hood.y_m, hood.z_m, source.x_m, source.y_m, source.z_m, hood.airflow_m3PerS)) return null;
  if (!(hood.faceWidth_m > 0 && hood.faceHeight_m > 0 && hood.airflow_m3PerS >= 0)) return null;
  const n = hoodAxis(hood.direction);
  const r = { x: source.x_m - hood.x_m, y: source.y_m - hood.y_m, z: source.z_m - hood.z_m };
  const axial_m = r.x * n.x + r.y * n.y + r.z * n.z;
  const offAxis_m = Math.sqrt(Math.max(0, r.x ** 2 + r.y ** 2 + r.z ** 2 - axial_m ** 2));
  const faceArea_m2 = hood.faceWidth_m * hood.faceHeight_m;
  const behind = axial_m < 0;
  const range = release ? captureVelocityRange(release) : null;
  // The engine treats faceWidth as the slot's length, so the same is used here.
  const geometry = { kind: hood.kind, faceArea_m2, slotLength_m: hood.faceWidth_m };
  const centerline_mPerS = behind ? null : hoodCenterlineVelocity({ ...geometry, airflow_m3PerS: hood.airflow_m3PerS }, axial_m);
  const rule: ValidityRule = hood.kind === 'booth' ? 'booth' : isSlot(hood.kind) ? 'slot' : 'diameters';
  const validUpTo_m = rule === 'slot' ? SLOT_REACH_m : VALID_DIAMETERS * equivalentDiameter_m(faceArea_m2);
  return {
    axial_m,
    offAxis_m,
    behind,
    centerline_mPerS,
    airflowForRange_m3PerS: behind || !range ? null : hoodRequiredAirflow(geometry, range.min_mPerS, axial_m),
    range,
    verdict: centerline_mPerS === null || !range ? null : captureVerdict(centerline_mPerS, range),
    faceVelocity_mPerS: hood.airflow_m3PerS / faceArea_m2,
    rule,
    validUpTo_m,
    beyondValidity: rule !== 'booth' && !behind && axial_m > validUpTo_m,
    // Off the axis the real field falls faster than the centre-line figure says.
    farOffAxis: !behind && offAxis_m > Math.max(axial_m, 0.05),
  };
}

export interface BenchHint {
  faceVelocity_mPerS: number;
  /** Height of the source above the work surface, and its offset from the surface's centre in plan. */
  height_m: number;
  offCentre_m: number;
  overSurface: boolean;
  range: CaptureVelocityRange;
  /** Null when the source is not over the surface: the guidance does not apply there. */
  verdict: CaptureVerdict | null;
  /** Airflow that brings the face velocity to the low end of the guidance, Q = V·A. */
  airflowForRange_m3PerS: number;
}

// A bench is read by its face velocity over the work surface (shared/physics/bench-face-velocity.ts), not by a centre line.
export function benchHint(hood: HoodInput, source: { x_m: number; y_m: number; z_m: number }): BenchHint | null {
  if (!usable(hood.x_m, hood.y_m, hood.z_m, source.x_m, source.y_m, source.z_m, hood.airflow_m3PerS)) return null;
  if (!(hood.faceWidth_m > 0 && hood.faceHeight_m > 0 && hood.airflow_m3PerS >= 0)) return null;
  const check = benchFaceCheck(hood, source);
  const range = { ...BENCH_FACE_VELOCITY, examples: [...BENCH_FACE_VELOCITY.examples] };
  return {
    faceVelocity_mPerS: check.faceVelocity_mPerS,
    height_m: check.height_m,
    offCentre_m: Math.hypot(source.x_m - hood.x_m, source.y_m - hood.y_m),
    overSurface: check.overSurface,
    range,
    verdict: check.overSurface ? captureVerdict(check.faceVelocity_mPerS, range) : null,
    airflowForRange_m3PerS: range.min_mPerS * hood.faceWidth_m * hood.faceHeight_m,
  };
}
