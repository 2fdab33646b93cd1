import type { Fraction } from '../../../../shared/vocabulary/fractions';
import type { CompareColumn } from '@/features/compare/lib/types';

// Colour and dash pattern together, so four lines stay apart in grey print and for colour-blind readers.
export const SERIES_LOOK = [
  { stroke: '#1f6f6a', dash: undefined },
  { stroke: '#9b4a12', dash: '8 4' },
  { stroke: '#3d55a0', dash: '2 3' },
  { stroke: '#7a3b84', dash: '12 4 2 4' },
] as const;

export interface ChartPoint {
  t_min: number;
  mean: number;
  lo: number;
  hi: number;
}

export interface ChartSeries {
  id: number;
  name: string;
  points: ChartPoint[];
}

export function chartSeries(columns: readonly CompareColumn[], fraction: Fraction): ChartSeries[] {
  return columns.flatMap((c) => {
    if (!c.run) return [];
    const band = c.run.series.bands[fraction];
    const points = c.run.series.time_s
      .map((t, i) => ({
        t_min: t / 60,
        mean: band.mean[i],
        lo: Number.isFinite(band.lo[i]) ? band.lo[i] : band.mean[i],
        hi: Number.isFinite(band.hi[i]) ? band.hi[i] : band.mean[i],
      }))
      .filter((p) => Number.isFinite(p.mean));
    return [{ id: c.id, name: c.name, points }];
  });
}

/** Distinct limits that apply to this fraction, each with the scenarios that carry it. */
export function limitsFor(columns: readonly CompareColumn[], fraction: Fraction): { value_mgPerM3: number; names: string[] }[] {
  const byValue = new Map<number, string[]>();
  for (const c of columns) {
    const l = c.run?.limit;
    if (l?.fraction === fraction) byValue.set(l.value_mgPerM3, [...(byValue.get(l.value_mgPerM3) ?? []), c.name]);
  }
  return [...byValue].map(([value_mgPerM3, names]) => ({ value_mgPerM3, names }));
}
