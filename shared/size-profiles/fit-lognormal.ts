import { normalQuantile } from '../physics/index';
import type { MassBins } from './mass-bins';

export type LognormalFit = { mmad_m: number; gsd: number };

// Points this close to 0 or 1 carry rounding noise but would dominate the fit through their huge probits.
const TAIL = 1e-3;

export function cumulativeAtEdges(bins: MassBins): number[] {
  const out = [0];
  for (const m of bins.massFraction) out.push(out[out.length - 1] + m);
  return out.map((c) => Math.min(1, c));
}

// Least squares of probit(F) = (ln d − ln MMAD)/ln σg on the bin edges (log-probability plot, Hinds §4.5).
export function fitLognormal(bins: MassBins): LognormalFit | null {
  const cumulative = cumulativeAtEdges(bins);
  const inner = bins.edges_m.map((d, i) => ({ x: Math.log(d), F: cumulative[i] })).filter((p) => p.F > 0 && p.F < 1);
  const trimmed = inner.filter((p) => p.F >= TAIL && p.F <= 1 - TAIL);
  const points = (trimmed.length >= 2 ? trimmed : inner).map((p) => ({ x: p.x, y: normalQuantile(p.F) }));
  if (points.length < 2) return null;
  const n = points.length;
  const meanX = points.reduce((a, p) => a + p.x, 0) / n;
  const meanY = points.reduce((a, p) => a + p.y, 0) / n;
  let sxx = 0;
  let sxy = 0;
  for (const p of points) {
    sxx += (p.x - meanX) ** 2;
    sxy += (p.x - meanX) * (p.y - meanY);
  }
  const slope = sxy / sxx;
  if (!(slope > 0) || !Number.isFinite(slope)) return null;
  return { mmad_m: Math.exp(meanX - meanY / slope), gsd: Math.exp(1 / slope) };
}
