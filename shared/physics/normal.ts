import { exp, log } from '../det-math/index';

const SQRT_PI = Math.sqrt(Math.PI);

// Below this the positive series is accurate; above it the continued fraction converges in few terms.
const SERIES_LIMIT = 1.5;

// erf(x) = (2/√π)·e^(−x²)·Σ 2ⁿx^(2n+1)/(2n+1)!! (Abramowitz & Stegun 7.1.6): all terms positive, no cancellation.
function erfSeries(x: number): number {
  let term = x;
  let sum = x;
  for (let n = 1; n < 200 && term > 1e-17 * sum; n++) {
    term *= (2 * x * x) / (2 * n + 1);
    sum += term;
  }
  return (2 / SQRT_PI) * exp(-x * x) * sum;
}

// e^(x²)·erfc(x) by the Laplace continued fraction (Abramowitz & Stegun 7.1.14), modified Lentz.
function erfcxContinuedFraction(x: number): number {
  const tiny = 1e-300;
  let f = x;
  let c = x;
  let d = 0;
  for (let n = 1; n < 500; n++) {
    const a = n / 2;
    d = x + a * d;
    d = d === 0 ? tiny : 1 / d;
    c = x + a / c;
    if (c === 0) c = tiny;
    const delta = c * d;
    f *= delta;
    if (Math.abs(delta - 1) < 1e-16) break;
  }
  return 1 / (SQRT_PI * f);
}

// Scaled complementary error function e^(x²)·erfc(x), for products that would overflow unscaled.
export function erfcx(x: number): number {
  if (Number.isNaN(x)) return NaN;
  if (x >= SERIES_LIMIT) return erfcxContinuedFraction(x);
  return exp(x * x) * erfc(x);
}

// Complementary error function to near double precision (A&S 7.1.6 and 7.1.14).
export function erfc(x: number): number {
  if (Number.isNaN(x)) return NaN;
  if (x < 0) return 2 - erfc(-x);
  if (x === Infinity) return 0;
  if (x < SERIES_LIMIT) return 1 - erfSeries(x);
  return exp(-x * x) * erfcxContinuedFraction(x);
}

// Standard normal CDF Φ(z) = ½·erfc(−z/√2).
export function normalCdf(z: number): number {
  return 0.5 * erfc(-z / Math.SQRT2);
}

const A = [-3.969683028665376e1, 2.209460984245205e2, -2.759285104469687e2, 1.38357751867269e2, -3.066479806614716e1, 2.506628277459239];
const B = [-5.447609879822406e1, 1.615858368580409e2, -1.556989798598866e2, 6.680131188771972e1, -1.328068155288572e1];
const C = [-7.784894002430293e-3, -3.223964580411365e-1, -2.400758277161838, -2.549732539343734, 4.374664141464968, 2.938163982698783];
const D = [7.784695709041462e-3, 3.224671290700398e-1, 2.445134137142996, 3.754408661907416];
const P_LOW = 0.02425;

// Acklam's rational approximation, used only as the start for Halley refinement.
function acklamGuess(p: number): number {
  if (p < P_LOW || p > 1 - P_LOW) {
    const q = Math.sqrt(-2 * log(p < P_LOW ? p : 1 - p));
    const x = (((((C[0] * q + C[1]) * q + C[2]) * q + C[3]) * q + C[4]) * q + C[5]) / ((((D[0] * q + D[1]) * q + D[2]) * q + D[3]) * q + 1);
    return p < P_LOW ? x : -x;
  }
  const q = p - 0.5;
  const r = q * q;
  return (
    ((((((A[0] * r + A[1]) * r + A[2]) * r + A[3]) * r + A[4]) * r + A[5]) * q) /
    (((((B[0] * r + B[1]) * r + B[2]) * r + B[3]) * r + B[4]) * r + 1)
  );
}

// Inverse standard normal CDF: Acklam's start, two Halley steps on Φ(x) − p (P. J. Acklam's published algorithm).
export function normalQuantile(p: number): number {
  if (!(p >= 0 && p <= 1)) throw new RangeError(`p must be a probability in [0, 1], got ${String(p)}`);
  if (p === 0) return -Infinity;
  if (p === 1) return Infinity;
  let x = acklamGuess(p);
  for (let i = 0; i < 2; i++) {
    const error = p < 0.5 ? normalCdf(x) - p : 1 - p - 0.5 * erfc(x / Math.SQRT2);
    const step = error * Math.sqrt(2 * Math.PI) * exp((x * x) / 2);
    x -= step / (1 + (x * step) / 2);
  }
  return x;
}
