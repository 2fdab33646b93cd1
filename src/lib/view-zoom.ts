// Which part of a to-scale room drawing is shown: a zoom factor (1 = the whole room) about a centre,
// in room metres along the drawing's two axes (a to the right, b up). Pure, so both the editor and
// the result views share it and unit tests cover it without a DOM.

export interface Zoom {
  k: number;
  ca_m: number;
  cb_m: number;
}
export interface Span {
  a_m: number;
  b_m: number;
}
export interface ViewWindow {
  a0_m: number;
  a1_m: number;
  b0_m: number;
  b1_m: number;
}
export interface Point2 {
  a_m: number;
  b_m: number;
}

export const MAX_ZOOM = 24;
export const ZOOM_STEP = 1.5;
// Room around the workstation's outermost marker when zooming to it: the breathing zone and a hood face stay whole.
export const FOCUS_PAD_m = 0.6;

const clamp = (v: number, lo: number, hi: number) => (v < lo ? lo : v > hi ? hi : v);

export const wholeRoom = (span: Span): Zoom => ({ k: 1, ca_m: span.a_m / 2, cb_m: span.b_m / 2 });

/** Keeps the window inside the room and the zoom between the whole room and MAX_ZOOM. */
export function clampZoom(z: Zoom, span: Span): Zoom {
  const k = clamp(Number.isFinite(z.k) ? z.k : 1, 1, MAX_ZOOM);
  const ha = span.a_m / (2 * k);
  const hb = span.b_m / (2 * k);
  return { k, ca_m: clamp(z.ca_m, ha, span.a_m - ha), cb_m: clamp(z.cb_m, hb, span.b_m - hb) };
}

export function windowOf(z: Zoom, span: Span): ViewWindow {
  const c = clampZoom(z, span);
  const ha = span.a_m / (2 * c.k);
  const hb = span.b_m / (2 * c.k);
  return { a0_m: c.ca_m - ha, a1_m: c.ca_m + ha, b0_m: c.cb_m - hb, b1_m: c.cb_m + hb };
}

/** Zooms by a factor, keeping the anchor (default: the centre) where it is on screen. */
export function zoomBy(z: Zoom, factor: number, span: Span, anchor?: Point2): Zoom {
  const c = clampZoom(z, span);
  const next = clamp(c.k * factor, 1, MAX_ZOOM);
  const f = next / c.k;
  const a = anchor ?? { a_m: c.ca_m, b_m: c.cb_m };
  return clampZoom({ k: next, ca_m: a.a_m + (c.ca_m - a.a_m) / f, cb_m: a.b_m + (c.cb_m - a.b_m) / f }, span);
}

export function panBy(z: Zoom, da_m: number, db_m: number, span: Span): Zoom {
  const c = clampZoom(z, span);
  return clampZoom({ k: c.k, ca_m: c.ca_m + da_m, cb_m: c.cb_m + db_m }, span);
}

/** The closest zoom that shows every point with FOCUS_PAD_m to spare. */
export function fitPoints(points: readonly Point2[], span: Span, pad_m = FOCUS_PAD_m): Zoom {
  if (points.length === 0) return wholeRoom(span);
  const as = points.map((p) => p.a_m);
  const bs = points.map((p) => p.b_m);
  const a0 = Math.min(...as) - pad_m;
  const a1 = Math.max(...as) + pad_m;
  const b0 = Math.min(...bs) - pad_m;
  const b1 = Math.max(...bs) + pad_m;
  const k = Math.min(span.a_m / (a1 - a0), span.b_m / (b1 - b0));
  return clampZoom({ k, ca_m: (a0 + a1) / 2, cb_m: (b0 + b1) / 2 }, span);
}

/** Grid spacing (m) that leaves at least minGap_px between lines at this scale. */
export function gridSpacing_m(scale_pxPerM: number, minGap_px: number): number {
  return [0.05, 0.1, 0.2, 0.5, 1, 2, 5, 10, 20, 50].find((s) => s * scale_pxPerM >= minGap_px) ?? 100;
}

/** Multiples of step inside [lo, hi], rounded so 0.1-m steps print as 0.3, not 0.30000000000000004. */
export function stepsWithin(lo: number, hi: number, step: number): number[] {
  const out: number[] = [];
  for (let i = Math.ceil(lo / step - 1e-9); i * step <= hi + 1e-9; i++) out.push(Math.round(i * step * 1000) / 1000 + 0);
  return out;
}
