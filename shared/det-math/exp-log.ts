/**
 * exp, log, pow and expm1 in plain IEEE arithmetic, so every JavaScript engine gives the same bits
 * (the language leaves Math.exp and friends implementation-approximated). The algorithms are
 * fdlibm's (Sun Microsystems, 1993: e_exp.c, e_log.c, s_expm1.c); V8 ships the same ports, so Node
 * and Chromium agree with Math.* as well. +, −, ×, ÷, Math.sqrt, Math.abs and Math.floor are
 * exactly rounded everywhere.
 */
import * as words from './words';

// Module-local copies: a module runner (Vitest's) may read imported bindings through getters, and
// these are touched on every call.
const HI = words.HI;
const IO = words.IO;
const INV_LN2 = words.INV_LN2;
const LN2_HI = words.LN2_HI;
const LN2_LO = words.LN2_LO;
const LO = words.LO;
const POW2 = words.POW2;
const f64 = words.f64;
const u32 = words.u32;

const P1 = 1.66666666666666019037e-1;
const P2 = -2.77777777770155933842e-3;
const P3 = 6.61375632143793436117e-5;
const P4 = -1.6533902205465251539e-6;
const P5 = 4.13813679705723846039e-8;

export function exp(x: number): number {
  IO[0] = x;
  expIO();
  return IO[0];
}

/** exp of IO[0] into IO[0] (the step loop's form; words.IO), with no double crossing a call. */
export function expIO(): void {
  let x = IO[0];
  if (x !== x) return;
  // The one input where fdlibm's result is a rounding short of the correctly rounded value (V8 agrees).
  if (x === 1) {
    IO[0] = 2.718281828459045;
    return;
  }
  if (x > 7.09782712893383973096e2) {
    IO[0] = Infinity;
    return;
  }
  if (x < -7.4513321910194110842e2) {
    IO[0] = 0;
    return;
  }
  f64[0] = x;
  const hx = u32[HI] & 0x7fffffff;
  let hi = 0;
  let lo = 0;
  let k = 0;
  if (hx > 0x3fd62e42) {
    if (hx < 0x3ff0a2b2) k = x < 0 ? -1 : 1;
    else k = Math.trunc(INV_LN2 * x + (x < 0 ? -0.5 : 0.5));
    hi = x - k * LN2_HI;
    lo = k * LN2_LO;
    x = hi - lo;
  } else if (hx < 0x3e300000) {
    IO[0] = 1 + x;
    return;
  }
  const t = x * x;
  const c = x - t * (P1 + t * (P2 + t * (P3 + t * (P4 + t * P5))));
  if (k === 0) {
    IO[0] = 1 - ((x * c) / (c - 2) - x);
    return;
  }
  const y = 1 - (lo - (x * c) / (2 - c) - hi);
  // scale(y, k), written out.
  IO[0] =
    k > 1023
      ? y * POW2[1022 + 1023] * POW2[1022 + k - 1023]
      : k < -1021
        ? y * POW2[1022 + k + 1000] * POW2[1022 - 1000]
        : y * POW2[1022 + k];
}

const TWO54 = 1.8014398509481984e16;
const LG1 = 6.66666666666673513e-1;
const LG2 = 3.999999999940941908e-1;
const LG3 = 2.857142874366239149e-1;
const LG4 = 2.222219843214978396e-1;
const LG5 = 1.818357216161805012e-1;
const LG6 = 1.531383769920937332e-1;
const LG7 = 1.479819860511658591e-1;

export function log(x: number): number {
  IO[0] = x;
  logIO();
  return IO[0];
}

/** log of IO[0] into IO[0] (the step loop's form; words.IO), with no double crossing a call. */
export function logIO(): void {
  let x = IO[0];
  f64[0] = x;
  let hx = u32[HI] | 0;
  const lx = u32[LO];
  let k = 0;
  if (hx < 0x00100000) {
    if (((hx & 0x7fffffff) | lx) === 0) {
      IO[0] = -Infinity;
      return;
    }
    if (hx < 0) {
      IO[0] = NaN;
      return;
    }
    k -= 54;
    x *= TWO54;
    f64[0] = x;
    hx = u32[HI] | 0;
  }
  if (hx >= 0x7ff00000) {
    IO[0] = x + x;
    return;
  }
  k += (hx >> 20) - 1023;
  hx &= 0x000fffff;
  const i0 = (hx + 0x95f64) & 0x100000;
  // x (or x/2) brought into [√2/2, √2): the exponent bits replaced, the mantissa kept.
  f64[0] = x;
  u32[HI] = hx | (i0 ^ 0x3ff00000);
  x = f64[0];
  k += i0 >> 20;
  const f = x - 1;
  const dk = k;
  if ((0x000fffff & (2 + hx)) < 3) {
    if (f === 0) {
      IO[0] = k === 0 ? 0 : dk * LN2_HI + dk * LN2_LO;
      return;
    }
    const r = f * f * (0.5 - 0.3333333333333333 * f);
    IO[0] = k === 0 ? f - r : dk * LN2_HI - (r - dk * LN2_LO - f);
    return;
  }
  const s = f / (2 + f);
  const z = s * s;
  const w = z * z;
  const t1 = w * (LG2 + w * (LG4 + w * LG6));
  const t2 = z * (LG1 + w * (LG3 + w * (LG5 + w * LG7)));
  const r = t2 + t1;
  if (((hx - 0x6147a) | (0x6b851 - hx)) > 0) {
    const hfsq = 0.5 * f * f;
    IO[0] = k === 0 ? f - (hfsq - s * (hfsq + r)) : dk * LN2_HI - (hfsq - (s * (hfsq + r) + dk * LN2_LO) - f);
    return;
  }
  IO[0] = k === 0 ? f - s * (f - r) : dk * LN2_HI - (s * (f - r) - dk * LN2_LO - f);
}

// Dekker's exact product: a·b = p + productError(a, b, p) with no fused multiply-add.
const SPLIT = 134217729;
function productError(a: number, b: number, p: number): number {
  let c = SPLIT * a;
  const ah = c - (c - a);
  const al = a - ah;
  c = SPLIT * b;
  const bh = c - (c - b);
  const bl = b - bh;
  return ah * bh - p + ah * bl + al * bh + al * bl;
}

/**
 * x^y. Small integer powers by repeated squaring (one rounding per product, within 3 ulp for
 * the small powers the engine takes); otherwise exp(y·ln x) with ln x carried to about twice double
 * precision (one Newton step through exp) and y·ln x split exactly, so the error stays near
 * (1 + |y|/2) ulp instead of growing with |y·ln x|.
 */
export function pow(x: number, y: number): number {
  if (y === 0) return 1;
  if (x !== x || y !== y) return NaN;
  if (Number.isInteger(y) && Math.abs(y) <= 64) {
    let n = Math.abs(y);
    let base = x;
    let result = 1;
    while (n > 0) {
      if (n & 1) result *= base;
      n >>>= 1;
      if (n > 0) base *= base;
    }
    return y < 0 ? 1 / result : result;
  }
  if (x === 0) return y < 0 ? Infinity : 0;
  if (x < 0) {
    if (!Number.isInteger(y)) return NaN;
    const magnitude = pow(-x, y);
    return y % 2 === 0 ? magnitude : -magnitude;
  }
  if (x === Infinity) return y < 0 ? 0 : Infinity;
  const l = log(x);
  const e = exp(l);
  const lTail = e > 0 && e < Infinity ? (x - e) / e : 0;
  const head = y * l;
  if (head > 709.79) return Infinity;
  if (head < -745.2) return 0;
  const tail = productError(y, l, head) + y * lTail;
  const v = exp(head);
  return v + v * tail;
}

const Q1 = -3.33333333333331316428e-2;
const Q2 = 1.58730158725481460165e-3;
const Q3 = -7.93650757867487942473e-5;
const Q4 = 4.00821782732936239552e-6;
const Q5 = -2.01099218183624371326e-7;

/** e^x − 1 without cancellation for small x: fdlibm's s_expm1.c (argument reduction by ln 2, a rational kernel). */
export function expm1(x: number): number {
  IO[0] = x;
  expm1IO();
  return IO[0];
}

/** e^x − 1 of IO[0] into IO[0] (the step loop's form; words.IO), with no double crossing a call. */
export function expm1IO(): void {
  let x = IO[0];
  f64[0] = x;
  let hx = u32[HI] | 0;
  const negative = hx < 0;
  hx &= 0x7fffffff;
  if (hx >= 0x4043687a) {
    // |x| ≥ 56·ln 2: −1 below, e^x alone above (and its overflow).
    if (hx >= 0x7ff00000) {
      IO[0] = Number.isNaN(x) ? x : negative ? -1 : x;
      return;
    }
    if (negative) {
      IO[0] = -1;
      return;
    }
    if (x > 7.09782712893383973096e2) {
      IO[0] = Infinity;
      return;
    }
  }
  let k = 0;
  let c = 0;
  if (hx > 0x3fd62e42) {
    // |x| > ½ ln 2: x = k·ln 2 + r with r split into hi − lo.
    let hi: number;
    let lo: number;
    if (hx < 0x3ff0a2b2) {
      k = negative ? -1 : 1;
      hi = negative ? x + LN2_HI : x - LN2_HI;
      lo = negative ? -LN2_LO : LN2_LO;
    } else {
      k = Math.trunc(INV_LN2 * x + (negative ? -0.5 : 0.5));
      hi = x - k * LN2_HI;
      lo = k * LN2_LO;
    }
    x = hi - lo;
    c = hi - x - lo;
  } else if (hx < 0x3c900000) {
    return;
  }
  const hfx = 0.5 * x;
  const hxs = x * hfx;
  const r1 = 1 + hxs * (Q1 + hxs * (Q2 + hxs * (Q3 + hxs * (Q4 + hxs * Q5))));
  const t = 3 - r1 * hfx;
  let e = hxs * ((r1 - t) / (6 - x * t));
  if (k === 0) {
    IO[0] = x - (x * e - hxs);
    return;
  }
  e = x * (e - c) - c;
  e -= hxs;
  if (k === -1) {
    IO[0] = 0.5 * (x - e) - 0.5;
    return;
  }
  if (k === 1) {
    IO[0] = x < -0.25 ? -2 * (e - (x + 0.5)) : 1 + 2 * (x - e);
    return;
  }
  // scale(y, k) as in expIO, written out.
  const y = k <= -2 || k > 56 ? 1 - (e - x) : k < 20 ? 1 - POW2[1022 - k] - (e - x) : x - (e + POW2[1022 - k]) + 1;
  const scaled =
    k > 1023
      ? y * POW2[1022 + 1023] * POW2[1022 + k - 1023]
      : k < -1021
        ? y * POW2[1022 + k + 1000] * POW2[1022 - 1000]
        : y * POW2[1022 + k];
  IO[0] = k <= -2 || k > 56 ? scaled - 1 : scaled;
}
