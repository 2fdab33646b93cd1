/**
 * The bit-level helpers the deterministic functions share: word access to a double, exact powers
 * of two, and ln 2 split for argument reduction (fdlibm's constants).
 */
import { scratchFloat64 } from './scratch';

// Word access to a double; every platform a browser or Node runs on is little-endian, checked once.
export const f64 = scratchFloat64(1);
export const u32 = new Uint32Array(f64.buffer, f64.byteOffset, 2);
f64[0] = 1;
export const HI = u32[1] === 0x3ff00000 ? 1 : 0;
export const LO = 1 - HI;

/**
 * The argument and result slots of the step loop's forms (expIO, expm1IO, logIO, atanIO, atan2IO): a double that
 * crosses a call V8 has not inlined is boxed on the heap, and the walk makes a few hundred such calls a
 * step; through this array nothing crosses. Arguments in IO[0] (atan2: y in IO[0], x in IO[1]), the result in IO[0].
 */
export const IO = scratchFloat64(2);

export function highWord(x: number): number {
  f64[0] = x;
  return u32[HI] | 0;
}

// Powers of two 2^-1022…2^1023 by exact doubling, so scaling never touches the bits.
export const POW2 = new Float64Array(2046);
POW2[1022] = 1;
for (let k = 1; k <= 1023; k++) POW2[1022 + k] = POW2[1021 + k] * 2;
for (let k = 1; k <= 1022; k++) POW2[1022 - k] = POW2[1023 - k] * 0.5;

/** y · 2^k; each product by a power of two is exact unless the result is subnormal (then one rounding, as fdlibm). */
export function scale(y: number, k: number): number {
  if (k > 1023) return y * POW2[1022 + 1023] * POW2[1022 + k - 1023];
  if (k < -1021) return y * POW2[1022 + k + 1000] * POW2[1022 - 1000];
  return y * POW2[1022 + k];
}

export const LN2_HI = 6.9314718036912381649e-1;
export const LN2_LO = 1.90821492927058770002e-10;
export const INV_LN2 = 1.442695040888963387;
