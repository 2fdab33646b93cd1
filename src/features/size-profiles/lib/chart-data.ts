import { formatSig, percentText } from '../../../../shared/format/index';
import { normalCdf } from '../../../../shared/physics/index';
import type { MassBins } from '../../../../shared/size-profiles/index';
import { metresToMicrometres } from '../../../../shared/units';

export type HistogramBar = { lower_um: number; upper_um: number; perLogWidth: number };

// dM/dlog d: bins of different widths compare fairly only per unit of log width.
export function histogramBars(bins: MassBins): HistogramBar[] {
  return bins.massFraction.map((m, i) => {
    const lower_um = metresToMicrometres(bins.edges_m[i]);
    const upper_um = metresToMicrometres(bins.edges_m[i + 1]);
    return { lower_um, upper_um, perLogWidth: m / Math.log10(upper_um / lower_um) };
  });
}

export function cumulativePoints(bins: MassBins): { d_um: number; F: number }[] {
  let F = 0;
  return bins.edges_m.map((d, i) => {
    if (i > 0) F = Math.min(1, F + bins.massFraction[i - 1]);
    return { d_um: metresToMicrometres(d), F };
  });
}

export const micrometres = (d_m: number | null) => (d_m === null ? '—' : `${formatSig(metresToMicrometres(d_m), 3)} µm`);
export const percent = (f: number) => percentText(100 * f);
export const plain = (v: number | null) => (v === null ? '—' : formatSig(v, 3));

export function decadeTicks_um(min_um: number, max_um: number): number[] {
  const ticks: number[] = [];
  for (let e = Math.floor(Math.log10(min_um)); e <= Math.ceil(Math.log10(max_um)); e++) {
    for (const m of [1, 2, 5]) {
      const v = Number((m * 10 ** e).toPrecision(2));
      if (v >= min_um * 0.999 && v <= max_um * 1.001) ticks.push(v);
    }
  }
  return ticks;
}

export type CurvePoint = { d_um: number; value: number };

// Evenly spaced in log d, so the curve is as smooth at 0.5 µm as at 50 µm.
function logSpaced(min_um: number, max_um: number, points: number): number[] {
  const a = Math.log(min_um);
  const step = (Math.log(max_um) - a) / (points - 1);
  return Array.from({ length: points }, (_, i) => Math.exp(a + i * step));
}

/** The fitted lognormal's mass per decade, dM/dlog d = ln 10 · φ(z) / ln GSD with z = ln(d / MMAD) / ln GSD (the lognormal mass distribution, Hinds ch. 4, from memory). */
export function fittedPerDecade(mmad_m: number, gsd: number, min_um: number, max_um: number, points = 121): CurvePoint[] {
  const s = Math.log(gsd);
  const mmad_um = metresToMicrometres(mmad_m);
  return logSpaced(min_um, max_um, points).map((d_um) => {
    const z = Math.log(d_um / mmad_um) / s;
    return { d_um, value: (Math.LN10 * Math.exp(-0.5 * z * z)) / (Math.sqrt(2 * Math.PI) * s) };
  });
}

/** The fitted lognormal's cumulative mass below d, Φ(ln(d / MMAD) / ln GSD), as a fraction. */
export function fittedCumulative(mmad_m: number, gsd: number, min_um: number, max_um: number, points = 121): CurvePoint[] {
  const s = Math.log(gsd);
  const mmad_um = metresToMicrometres(mmad_m);
  return logSpaced(min_um, max_um, points).map((d_um) => ({ d_um, value: normalCdf(Math.log(d_um / mmad_um) / s) }));
}
