import { decimalOrNaN } from '../../../../shared/format/index';
import { POSTURE_BREATHING_HEIGHT_m, type Posture } from '../../../../shared/vocabulary/index';

// A posture change moves the breathing zone to that posture's usual height, unless the person typed one of their own
// (a measured height outranks a typical one).
export function heightForPosture(current: string, from: Posture, to: Posture): string {
  const typed = decimalOrNaN(current);
  const untouched = !Number.isFinite(typed) || typed === POSTURE_BREATHING_HEIGHT_m[from];
  return untouched ? String(POSTURE_BREATHING_HEIGHT_m[to]) : current;
}
