/**
 * sin, cos, atan and atan2 in plain IEEE arithmetic (fdlibm: k_sin.c, k_cos.c, the Cody–Waite part
 * of e_rem_pio2.c, s_atan.c, e_atan2.c), bit for bit the same in every JavaScript engine.
 */
import * as words from './words';

// Module-local copies: a module runner (Vitest's) may read imported bindings through getters, and
// these are touched on every call.
const HI = words.HI;
const IO = words.IO;
const LO = words.LO;
const f64 = words.f64;
const highWord = words.highWord;
const u32 = words.u32;

const S1 = -1.66666666666666324348e-1;
const S2 = 8.33333333332248946124e-3;
const S3 = -1.98412698298579493134e-4;
const S4 = 2.75573137070700676789e-6;
const S5 = -2.50507602534068634195e-8;
const S6 = 1.58969099521155010221e-10;

// sin on [−π/4, π/4] for x + y, y the tail of the reduced argument (none when tail is false).
function kernelSin(x: number, y: number, tail: boolean): number {
  if (Math.abs(x) < 7.450580596923828e-9) return x;
  const z = x * x;
  const v = z * x;
  const r = S2 + z * (S3 + z * (S4 + z * (S5 + z * S6)));
  if (!tail) return x + v * (S1 + z * r);
  return x - (z * (0.5 * y - v * r) - y - v * S1);
}

const C1 = 4.16666666666666019037e-2;
const C2 = -1.38888888888741095749e-3;
const C3 = 2.48015872894767294178e-5;
const C4 = -2.75573143513906633035e-7;
const C5 = 2.0875723212981748279e-9;
const C6 = -1.13596475577881948265e-11;

function kernelCos(x: number, y: number): number {
  const ax = Math.abs(x);
  if (ax < 7.450580596923828e-9) return 1;
  const z = x * x;
  const r = z * (C1 + z * (C2 + z * (C3 + z * (C4 + z * (C5 + z * C6)))));
  if (ax < 0.3) return 1 - (0.5 * z - (z * r - x * y));
  // qx: |x|/4 cut to its high word, so 1 − qx is exact.
  let qx = 0.28125;
  if (ax <= 0.78125) {
    const hx = highWord(ax);
    f64[0] = 0;
    u32[HI] = hx - 0x00200000;
    qx = f64[0];
  }
  const hz = 0.5 * z - qx;
  const a = 1 - qx;
  return a - (hz - (z * r - x * y));
}

const INV_PIO2 = 6.36619772367581382433e-1;
const PIO2_1 = 1.57079632673412561417;
const PIO2_1T = 6.07710050650619224932e-11;
const PIO2_2 = 6.0771005063039659766e-11;
const PIO2_2T = 2.02226624879595063154e-21;
const PIO2_3 = 2.0222662487111664558e-21;
const PIO2_3T = 8.47842766036889956997e-32;

const exponentOf = (v: number) => (highWord(v) >> 20) & 0x7ff;

// |x| − n·π/2 as head + tail (π/2 in three 33-bit parts, a further part only when the first ones
// cancel). n·part is exact for n < 2^20; beyond |x| ≈ 8e5 (never an engine angle) the reduction
// loses accuracy but not determinism. Returns n; the parts land in reducedHead/Tail.
let reducedHead = 0;
let reducedTail = 0;
function reduce(ax: number): number {
  const n = Math.floor(ax * INV_PIO2 + 0.5);
  const j = exponentOf(ax);
  let r = ax - n * PIO2_1;
  let w = n * PIO2_1T;
  let y0 = r - w;
  if (j - exponentOf(y0) > 16) {
    let t = r;
    w = n * PIO2_2;
    r = t - w;
    w = n * PIO2_2T - (t - r - w);
    y0 = r - w;
    if (j - exponentOf(y0) > 49) {
      t = r;
      w = n * PIO2_3;
      r = t - w;
      w = n * PIO2_3T - (t - r - w);
      y0 = r - w;
    }
  }
  reducedHead = y0;
  reducedTail = r - y0 - w;
  return n;
}

const QUARTER_PI_HIGH = 0x3fe921fb;

export function sin(x: number): number {
  if ((highWord(x) & 0x7fffffff) <= QUARTER_PI_HIGH) return kernelSin(x, 0, false);
  if (!Number.isFinite(x)) return NaN;
  const n = reduce(Math.abs(x)) & 3;
  const h = reducedHead;
  const t = reducedTail;
  const s = n === 0 ? kernelSin(h, t, true) : n === 1 ? kernelCos(h, t) : n === 2 ? -kernelSin(h, t, true) : -kernelCos(h, t);
  return x < 0 ? -s : s;
}

export function cos(x: number): number {
  if ((highWord(x) & 0x7fffffff) <= QUARTER_PI_HIGH) return kernelCos(x, 0);
  if (!Number.isFinite(x)) return NaN;
  const n = reduce(Math.abs(x)) & 3;
  const h = reducedHead;
  const t = reducedTail;
  return n === 0 ? kernelCos(h, t) : n === 1 ? -kernelSin(h, t, true) : n === 2 ? -kernelCos(h, t) : kernelSin(h, t, true);
}

/** √(x² + y² + z²) from exactly rounded operations; no overflow guard (engine lengths are metres). */
export function hypot3(x: number, y: number, z = 0): number {
  return Math.sqrt(x * x + y * y + z * z);
}

// atan(0.5), atan(1), atan(1.5) and atan(∞) as head + tail (s_atan.c).
const ATAN_HI = Float64Array.of(4.63647609000806093515e-1, 7.85398163397448278999e-1, 9.82793723247329054082e-1, 1.570796326794896558);
const ATAN_LO = Float64Array.of(
  2.26987774529616870924e-17,
  3.06161699786838301793e-17,
  1.39033110312309984516e-17,
  6.12323399573676603587e-17,
);
const AT0 = 3.33333333333329318027e-1;
const AT1 = -1.99999999998764832476e-1;
const AT2 = 1.42857142725034663711e-1;
const AT3 = -1.1111110405462355788e-1;
const AT4 = 9.09088713343650656196e-2;
const AT5 = -7.69187620504482999495e-2;
const AT6 = 6.66107313738753120669e-2;
const AT7 = -5.83357013379057348645e-2;
const AT8 = 4.97687799461593236017e-2;
const AT9 = -3.6531572744216915527e-2;
const AT10 = 1.62858201153657823623e-2;

export function atan(x: number): number {
  IO[0] = x;
  atanIO();
  return IO[0];
}

/** atan of IO[0] into IO[0] (the step loop's form; words.IO), with no double crossing a call. */
export function atanIO(): void {
  let x = IO[0];
  f64[0] = x;
  const hx = u32[HI] | 0;
  const ix = hx & 0x7fffffff;
  let id: number;
  if (ix >= 0x44100000) {
    // |x| ≥ 2^66, infinities and NaN.
    if (x !== x) return;
    IO[0] = hx > 0 ? ATAN_HI[3] + ATAN_LO[3] : -ATAN_HI[3] - ATAN_LO[3];
    return;
  }
  if (ix < 0x3fdc0000) {
    // |x| < 0.4375
    if (ix < 0x3e400000) return;
    id = -1;
  } else {
    x = Math.abs(x);
    if (ix < 0x3ff30000) {
      if (ix < 0x3fe60000) {
        id = 0;
        x = (2 * x - 1) / (2 + x);
      } else {
        id = 1;
        x = (x - 1) / (x + 1);
      }
    } else if (ix < 0x40038000) {
      id = 2;
      x = (x - 1.5) / (1 + 1.5 * x);
    } else {
      id = 3;
      x = -1 / x;
    }
  }
  const z = x * x;
  const w = z * z;
  const s1 = z * (AT0 + w * (AT2 + w * (AT4 + w * (AT6 + w * (AT8 + w * AT10)))));
  const s2 = w * (AT1 + w * (AT3 + w * (AT5 + w * (AT7 + w * AT9))));
  if (id < 0) {
    IO[0] = x - x * (s1 + s2);
    return;
  }
  const r = ATAN_HI[id] - (x * (s1 + s2) - ATAN_LO[id] - x);
  IO[0] = hx < 0 ? -r : r;
}

const PI = Math.PI;
const PI_LO = 1.2246467991473532e-16;
const PI_O_2 = Math.PI / 2;
const PI_O_4 = Math.PI / 4;

/** The angle of (x, y) in (−π, π], e_atan2.c's case analysis around atan(|y/x|). */
export function atan2(y: number, x: number): number {
  IO[0] = y;
  IO[1] = x;
  atan2IO();
  return IO[0];
}

/** atan2(IO[0], IO[1]) into IO[0] (the step loop's form; words.IO), with no double crossing a call. */
export function atan2IO(): void {
  const y = IO[0];
  const x = IO[1];
  if (x !== x || y !== y) {
    IO[0] = NaN;
    return;
  }
  f64[0] = x;
  const hx = u32[HI] | 0;
  const lx = u32[LO];
  const ix = hx & 0x7fffffff;
  f64[0] = y;
  const hy = u32[HI] | 0;
  const ly = u32[LO];
  const iy = hy & 0x7fffffff;
  if (hx === 0x3ff00000 && lx === 0) {
    atanIO();
    return;
  }
  // 2·sign(x) + sign(y)
  const m = ((hy >>> 31) & 1) | ((hx >>> 30) & 2);
  if ((iy | ly) === 0) {
    IO[0] = m < 2 ? y : m === 2 ? PI : -PI;
    return;
  }
  if ((ix | lx) === 0) {
    IO[0] = hy < 0 ? -PI_O_2 : PI_O_2;
    return;
  }
  if (ix === 0x7ff00000) {
    IO[0] = iy === 0x7ff00000 ? [PI_O_4, -PI_O_4, 3 * PI_O_4, -3 * PI_O_4][m] : [0, -0, PI, -PI][m];
    return;
  }
  if (iy === 0x7ff00000) {
    IO[0] = hy < 0 ? -PI_O_2 : PI_O_2;
    return;
  }
  const k = (iy - ix) >> 20;
  // |y/x| > 2^60: ±π/2 whatever the sign of x.
  if (k > 60) {
    IO[0] = hy < 0 ? -(PI_O_2 + 0.5 * PI_LO) : PI_O_2 + 0.5 * PI_LO;
    return;
  }
  let z: number;
  if (hx < 0 && k < -60) z = 0;
  else {
    IO[0] = Math.abs(y / x);
    atanIO();
    z = IO[0];
  }
  IO[0] = m === 0 ? z : m === 1 ? -z : m === 2 ? PI - (z - PI_LO) : z - PI_LO - PI;
}
