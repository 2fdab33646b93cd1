import { requireNonNegative, requirePositive } from './validate';

import type { HoodKind } from '../vocabulary/hood-kinds';

export type { HoodKind };

export interface HoodGeometry {
  kind: HoodKind;
  faceArea_m2: number;
  slotLength_m?: number;
}

export interface Hood extends HoodGeometry {
  airflow_m3PerS: number;
}

/**
 * The fitted centre-line equations (Dalla Valle / ACGIH hood-types figure): an opening needs
 * Q/V = C·(10·X² + A), a slot Q/V = C·L·X. The engine's sink model reads the same numbers.
 */
export const OPENING_DISTANCE_FACTOR = 10;
export const HOOD_FIT_COEFFICIENT = { plain: 1, flanged: 0.75, slot: 3.7, 'flanged-slot': 2.6 } as const;

// Airflow per unit centre-line velocity at distance X: Dalla Valle / ACGIH hood-types figure.
function airflowPerVelocity_m2(hood: HoodGeometry, distance_m: number): number {
  const area_m2 = requirePositive('faceArea_m2', hood.faceArea_m2);
  switch (hood.kind) {
    case 'plain':
    case 'flanged':
      return HOOD_FIT_COEFFICIENT[hood.kind] * (OPENING_DISTANCE_FACTOR * distance_m * distance_m + area_m2);
    // The work surface is the bench's flange (the engine draws it so); its check is the face velocity (bench-face-velocity.ts).
    case 'downdraft-bench':
      return HOOD_FIT_COEFFICIENT.flanged * (OPENING_DISTANCE_FACTOR * distance_m * distance_m + area_m2);
    case 'slot':
    case 'flanged-slot':
      return HOOD_FIT_COEFFICIENT[hood.kind] * requirePositive('slotLength_m', hood.slotLength_m ?? NaN) * distance_m;
    case 'booth':
      return area_m2;
    default:
      throw new RangeError(`hood.kind must be plain, flanged, slot, flanged-slot, booth or downdraft-bench, got ${String(hood.kind)}`);
  }
}

// The equations are fitted away from the face; no point on the centre line outruns the face velocity Q/A.
function effectiveArea_m2(hood: HoodGeometry, distance_m: number): number {
  requireNonNegative('distance_m', distance_m);
  return Math.max(airflowPerVelocity_m2(hood, distance_m), hood.faceArea_m2);
}

// Centre-line velocity V(X) = Q/f(X) (ACGIH Industrial Ventilation hood-types figure; Dalla Valle).
export function hoodCenterlineVelocity(hood: Hood, distance_m: number): number {
  const airflow_m3PerS = requireNonNegative('airflow_m3PerS', hood.airflow_m3PerS);
  return airflow_m3PerS / effectiveArea_m2(hood, distance_m);
}

// Required airflow Q = V·f(X) (ACGIH Industrial Ventilation hood-types figure; Dalla Valle).
export function hoodRequiredAirflow(hood: HoodGeometry, captureVelocity_mPerS: number, distance_m: number): number {
  requireNonNegative('captureVelocity_mPerS', captureVelocity_mPerS);
  return captureVelocity_mPerS * effectiveArea_m2(hood, distance_m);
}
