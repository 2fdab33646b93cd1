import { formatSig, percentText } from '../../../../shared/format/index';
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
