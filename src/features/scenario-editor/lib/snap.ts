export const SNAP_m = 0.05;
export const NUDGE_m = 0.05;
export const BIG_NUDGE_m = 0.5;

/** Drag snap for the drawing's scale: whole centimetres once a 5 cm step would jump more than 12 px. */
export const snapFor = (scale_pxPerM: number) => (SNAP_m * scale_pxPerM > 12 ? 0.01 : SNAP_m);

export const clamp = (v: number, lo: number, hi: number) => Math.min(hi, Math.max(lo, v));

// Rounding to whole millimetres keeps 1.7 + 0.05 from showing as 1.7500000000000002.
const toMillimetre = (v: number) => Math.round(v * 1000) / 1000;

export function snapInside(v_m: number, max_m: number, step_m = SNAP_m): number {
  const snapped = Math.round(v_m / step_m) * step_m;
  // A room whose size is not a multiple of the step still lets the point reach the far wall.
  return toMillimetre(clamp(snapped, 0, max_m));
}

export function nudgeInside(v_m: number, delta_m: number, max_m: number): number {
  return toMillimetre(clamp(v_m + delta_m, 0, max_m));
}

export function nudgeFor(key: string, shift: boolean): { da: number; db: number } | null {
  const step = shift ? BIG_NUDGE_m : NUDGE_m;
  switch (key) {
    case 'ArrowRight':
      return { da: step, db: 0 };
    case 'ArrowLeft':
      return { da: -step, db: 0 };
    case 'ArrowUp':
      return { da: 0, db: step };
    case 'ArrowDown':
      return { da: 0, db: -step };
    default:
      return null;
  }
}
