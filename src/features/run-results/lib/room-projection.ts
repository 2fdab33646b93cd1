import type { Scenario } from '../../../../shared/schemas/scenario';
import { packHoods } from '../../../../workers/engine/hood-field';
import * as slots from '../../../../workers/engine/hood-slots';
import type { Point2, Span, ViewWindow } from '@/lib/view-zoom';

export type ViewKind = 'plan' | 'elevation';

export interface Projection {
  kind: ViewKind;
  /** Pixels per metre, the same on both axes so the drawing is to scale. */
  scale: number;
  width_m: number;
  height_m: number;
  /** The drawing area in pixels; the same whatever the zoom, so the page does not jump. */
  plotWidth: number;
  plotHeight: number;
  /** The part of the room shown (metres along the drawing's axes). */
  window: ViewWindow;
  /** Room coordinates (m) to SVG pixels inside the drawing area; up is +y (plan) or +z (elevation). */
  toSvg: (x_m: number, y_m: number, z_m: number) => [number, number];
  /** Drawing-area pixels back to metres along the drawing's axes. */
  fromSvg: (x_px: number, y_px: number) => Point2;
  horizontalLabel: string;
  verticalLabel: string;
}

export const viewSpan = (room: Scenario['room'], kind: ViewKind): Span => ({
  a_m: room.length_m,
  b_m: kind === 'plan' ? room.width_m : room.height_m,
});

export function projection(room: Scenario['room'], kind: ViewKind, drawingWidth_px: number, zoomed?: ViewWindow): Projection {
  const height_m = kind === 'plan' ? room.width_m : room.height_m;
  const w = zoomed ?? { a0_m: 0, a1_m: room.length_m, b0_m: 0, b1_m: height_m };
  const scale = drawingWidth_px / (w.a1_m - w.a0_m);
  return {
    kind,
    scale,
    width_m: room.length_m,
    height_m,
    plotWidth: drawingWidth_px,
    plotHeight: (w.b1_m - w.b0_m) * scale,
    window: w,
    toSvg: (x, y, z) => [(x - w.a0_m) * scale, (w.b1_m - (kind === 'plan' ? y : z)) * scale],
    fromSvg: (px, py) => ({ a_m: w.a0_m + px / scale, b_m: w.b1_m - py / scale }),
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

/** The workstation in a view's axes: source, breathing zone edge and hood face corners, to zoom to by default. */
export function focusPoints(s: Scenario, kind: ViewKind): Point2[] {
  const b = (p: { y_m: number; z_m: number }) => (kind === 'plan' ? p.y_m : p.z_m);
  const r = s.worker.radius_m;
  const points: Point2[] = [
    { a_m: s.source.x_m, b_m: b(s.source) },
    { a_m: s.worker.x_m - r, b_m: b(s.worker) - r },
    { a_m: s.worker.x_m + r, b_m: b(s.worker) + r },
  ];
  for (const h of hoodOutlines(s.hoods)) for (const [x, y, z] of h.corners) points.push({ a_m: x, b_m: kind === 'plan' ? y : z });
  return points;
}

/** Grid step in metres that keeps a metre grid unless the room is too big for one line per metre across the room. */
export function gridStep_m(length_m: number): number {
  return [1, 2, 5, 10, 20].find((s) => length_m / s <= 16) ?? 50;
}
