// Bisection: slower than Brent but cannot leave the bracket, and setup calls it only per size bin.
export function bisect(f: (x: number) => number, lo: number, hi: number, relativeTolerance = 1e-13): number {
  let fLo = f(lo);
  if (fLo === 0) return lo;
  const fHi = f(hi);
  if (fHi === 0) return hi;
  if (Math.sign(fLo) === Math.sign(fHi)) {
    throw new RangeError(`root is not bracketed by [${lo}, ${hi}]`);
  }
  for (let i = 0; i < 200; i++) {
    const mid = 0.5 * (lo + hi);
    const fMid = f(mid);
    if (fMid === 0 || hi - lo <= relativeTolerance * Math.abs(mid)) return mid;
    if (Math.sign(fMid) === Math.sign(fLo)) {
      lo = mid;
      fLo = fMid;
    } else {
      hi = mid;
    }
  }
  return 0.5 * (lo + hi);
}

// Widens a geometric bracket around a positive guess for an increasing function, then bisects.
export function solveIncreasingPositive(f: (x: number) => number, guess: number): number {
  let lo = guess;
  let hi = guess;
  for (let i = 0; i < 200 && f(lo) > 0; i++) lo /= 2;
  for (let i = 0; i < 200 && f(hi) < 0; i++) hi *= 2;
  return bisect(f, lo, hi);
}
