import type { Scenario } from '../../../../shared/schemas/scenario';
import { packHoods } from '../../../../workers/engine/hood-field';
import * as slots from '../../../../workers/engine/hood-slots';

export type ViewKind = 'plan' | 'elevation';

export interface Projection {
  kind: ViewKind;
  /** Pixels per metre, the same on both axes so the drawing is to scale. */
  scale: number;
  width_m: number;
  height_m: number;
  /** Room coordinates (m) to SVG pixels inside the drawing area; up is +y (plan) or +z (elevation). */
  toSvg: (x_m: number, y_m: number, z_m: number) => [number, number];
  horizontalLabel: string;
  verticalLabel: string;
}

export function projection(room: Scenario['room'], kind: ViewKind, drawingWidth_px: number): Projection {
  const scale = drawingWidth_px / room.length_m;
  const height_m = kind === 'plan' ? room.width_m : room.height_m;
  return {
    kind,
    scale,
    width_m: room.length_m,
    height_m,
    toSvg: (x, y, z) => [x * scale, (height_m - (kind === 'plan' ? y : z)) * scale],
    horizontalLabel: 'x along the room length (m)',
    verticalLabel: kind === 'plan' ? 'y across the room (m)' : 'z height above the floor (m)',
  };
}

export interface HoodOutline {
  name: string;
  /** Face corners in room coordinates, in drawing order. */
  corners: [number, number, number][];
  centre: [number, number, number];
  /** Unit vector out of the face into the room; air moves against it. */
  normal: [number, number, number];
}

// The engine's own packing fixes the face frame, so the drawing shows the face the engine simulates.
export function hoodOutlines(hoods: Scenario['hoods']): HoodOutline[] {
  const p = packHoods(hoods);
  return hoods.map((hood, h) => {
    const o = h * slots.HOOD_STRIDE;
    const c: [number, number, number] = [p[o + slots.HOOD_X], p[o + slots.HOOD_Y], p[o + slots.HOOD_Z]];
    const e1 = [p[o + slots.HOOD_E1X], p[o + slots.HOOD_E1Y], p[o + slots.HOOD_E1Z]];
    const e2 = [p[o + slots.HOOD_E2X], p[o + slots.HOOD_E2Y], p[o + slots.HOOD_E2Z]];
    const hw = p[o + slots.HOOD_HALF_WIDTH];
    const hh = p[o + slots.HOOD_HALF_HEIGHT];
    const corner = (a: number, b: number): [number, number, number] =>
      [0, 1, 2].map((k) => c[k] + a * hw * e1[k] + b * hh * e2[k]) as [number, number, number];
    return {
      name: hood.name ?? `Hood ${h + 1}`,
      corners: [corner(-1, -1), corner(1, -1), corner(1, 1), corner(-1, 1)],
      centre: c,
      normal: [p[o + slots.HOOD_NX], p[o + slots.HOOD_NY], p[o + slots.HOOD_NZ]],
    };
  });
}

/** Grid step in metres that keeps a metre grid unless the room is too big for one line per metre across the room. */
export function gridStep_m(length_m: number): number {
  return [1, 2, 5, 10, 20].find((s) => length_m / s <= 16) ?? 50;
}
