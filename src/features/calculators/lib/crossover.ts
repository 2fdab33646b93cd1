import { particleProperties, type ParticleMedium } from './particle-properties';

export const CHART_MIN_DIAMETER_m = 1e-9;
export const CHART_MAX_DIAMETER_m = 1e-4;

// ln(settling / Brownian) rises monotonically with diameter (≈ d² against ≈ d^-1/2), so one sign change at most.
function logRatio(diameter_m: number, medium: ParticleMedium): number {
  const p = particleProperties(diameter_m, medium);
  return Math.log(p.settlingDistance_m / p.rmsDisplacement_m);
}

// Bisection in log-diameter keeps equal relative precision across six decades; null when no crossing lies inside.
export function crossoverDiameter(
  medium: ParticleMedium,
  lo_m = CHART_MIN_DIAMETER_m,
  hi_m = CHART_MAX_DIAMETER_m,
  relativeTolerance = 1e-10,
): number | null {
  let lo = Math.log(lo_m);
  let hi = Math.log(hi_m);
  const fLo = logRatio(lo_m, medium);
  const fHi = logRatio(hi_m, medium);
  if (fLo === 0) return lo_m;
  if (fHi === 0) return hi_m;
  if (Math.sign(fLo) === Math.sign(fHi)) return null;
  for (let i = 0; i < 200 && hi - lo > relativeTolerance; i++) {
    const mid = 0.5 * (lo + hi);
    if (Math.sign(logRatio(Math.exp(mid), medium)) === Math.sign(fLo)) lo = mid;
    else hi = mid;
  }
  return Math.exp(0.5 * (lo + hi));
}
