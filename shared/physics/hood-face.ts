import type { HoodGeometry } from './hoods';
import { requirePositive } from './validate';

export interface HoodFace {
  halfWidth_m: number;
  halfHeight_m: number;
  frontShare: number;
}

// A flange saves a quarter of the airflow for the same centre-line speed (ACGIH hood-types figure),
// so a plain face draws 0.75 of a flanged face's front field and the rest from behind.
const PLAIN_FRONT_SHARE = 0.75;

// The rectangle and front share that the uniform sink panel uses for each hood kind; plain and
// flanged faces are taken as squares, a slot as L × A/L, a booth's open face as flanged by its walls,
// a downdraft bench as a flanged opening whose flange is the work surface around it.
export function hoodFace(hood: HoodGeometry): HoodFace {
  const area_m2 = requirePositive('faceArea_m2', hood.faceArea_m2);
  const half_m = Math.sqrt(area_m2) / 2;
  switch (hood.kind) {
    case 'plain':
      return { halfWidth_m: half_m, halfHeight_m: half_m, frontShare: PLAIN_FRONT_SHARE };
    case 'flanged':
    case 'booth':
    case 'downdraft-bench':
      return { halfWidth_m: half_m, halfHeight_m: half_m, frontShare: 1 };
    case 'slot':
    case 'flanged-slot': {
      const length_m = requirePositive('slotLength_m', hood.slotLength_m ?? NaN);
      const frontShare = hood.kind === 'slot' ? PLAIN_FRONT_SHARE : 1;
      return { halfWidth_m: length_m / 2, halfHeight_m: area_m2 / (2 * length_m), frontShare };
    }
    default:
      throw new RangeError(`hood.kind must be plain, flanged, slot, flanged-slot, booth or downdraft-bench, got ${String(hood.kind)}`);
  }
}
