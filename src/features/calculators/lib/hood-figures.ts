import {
  captureVelocityRange,
  hoodCenterlineVelocity,
  hoodRequiredAirflow,
  type CaptureVelocityRange,
  type HoodGeometry,
} from '../../../../shared/physics/index';
import { isSlotKind } from '../../../../shared/vocabulary/index';
import { airflowToPerSecond, type HoodCalculatorInput } from '../../../../shared/schemas/calculators';

// [S] ACGIH: duct transport velocity for average industrial dust.
export const TRANSPORT_VELOCITY_mPerS = { min: 18, max: 20 } as const;

// [M] the centre-line equations hold to about 1.5 equivalent hood diameters.
const VALID_DIAMETERS = 1.5;

// Slot equations apply at width/length ≤ 0.2, the opening equations above it (ACGIH hood-types figure).
const SLOT_ASPECT_LIMIT = 0.2;

export type CaptureVerdict = 'below' | 'within' | 'above';

export interface HoodFigures {
  geometry: HoodGeometry;
  airflow_m3PerS: number;
  centerline_mPerS: number;
  range: CaptureVelocityRange;
  verdict: CaptureVerdict;
  requiredForRange_m3PerS: { min: number; max: number };
  faceVelocity_mPerS: number;
  validUpTo_m: number;
  beyondValidity: boolean;
  aspectMismatch: boolean;
  ductDiameter_m: { min: number; max: number };
  velocityAt: (distance_m: number) => number;
}

// Half a percent of slack so a face sized to give exactly 1.00 m/s is not called "above" 1.0 by rounding.
const VERDICT_SLACK = 0.005;
function verdictFor(velocity_mPerS: number, range: CaptureVelocityRange): CaptureVerdict {
  if (velocity_mPerS < range.min_mPerS * (1 - VERDICT_SLACK)) return 'below';
  return velocity_mPerS > range.max_mPerS * (1 + VERDICT_SLACK) ? 'above' : 'within';
}

const ductDiameter = (airflow_m3PerS: number, velocity_mPerS: number) => Math.sqrt((4 * airflow_m3PerS) / (Math.PI * velocity_mPerS));

export function hoodFigures(input: HoodCalculatorInput): HoodFigures {
  const faceArea_m2 = input.width_m * input.height_m;
  const geometry: HoodGeometry = { kind: input.kind, faceArea_m2, slotLength_m: Math.max(input.width_m, input.height_m) };
  const range = captureVelocityRange(input.release);
  const airflow_m3PerS =
    input.basis === 'airflow'
      ? airflowToPerSecond(input.airflow, input.airflowUnit)
      : hoodRequiredAirflow(geometry, input.captureVelocity_mPerS, input.distance_m);
  const velocityAt = (distance_m: number) => hoodCenterlineVelocity({ ...geometry, airflow_m3PerS }, distance_m);
  const centerline_mPerS = velocityAt(input.distance_m);
  const validUpTo_m = VALID_DIAMETERS * Math.sqrt((4 * faceArea_m2) / Math.PI);
  const aspect = Math.min(input.width_m, input.height_m) / Math.max(input.width_m, input.height_m);
  const isSlot = isSlotKind(input.kind);
  return {
    geometry,
    airflow_m3PerS,
    centerline_mPerS,
    range,
    verdict: verdictFor(centerline_mPerS, range),
    requiredForRange_m3PerS: {
      min: hoodRequiredAirflow(geometry, range.min_mPerS, input.distance_m),
      max: hoodRequiredAirflow(geometry, range.max_mPerS, input.distance_m),
    },
    faceVelocity_mPerS: airflow_m3PerS / faceArea_m2,
    validUpTo_m,
    beyondValidity: input.kind !== 'booth' && input.distance_m > validUpTo_m,
    aspectMismatch: input.kind !== 'booth' && (isSlot ? aspect > SLOT_ASPECT_LIMIT : aspect < SLOT_ASPECT_LIMIT),
    // The slower bound gives the wider duct: anything between keeps dust moving without wasting fan power.
    ductDiameter_m: {
      min: ductDiameter(airflow_m3PerS, TRANSPORT_VELOCITY_mPerS.max),
      max: ductDiameter(airflow_m3PerS, TRANSPORT_VELOCITY_mPerS.min),
    },
    velocityAt,
  };
}
