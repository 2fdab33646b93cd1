import { FRACTIONS } from '../../../../shared/vocabulary/fractions';
import { FRACTION_LABEL } from '../../../../shared/vocabulary/index';
import type { RunResult } from '../../../../shared/schemas/run-result';

import { toCsv } from '@/lib/csv';

// The writer keeps four significant figures: finer than any run's statistical error, free of float noise.

export function fractionTableCsv(view: RunResult): string {
  const header = [
    'Fraction',
    'Task mean (mg/m³)',
    'Task mean 95 % CI low (mg/m³)',
    'Task mean 95 % CI high (mg/m³)',
    '8-h TWA (mg/m³)',
    '8-h TWA 95 % CI low (mg/m³)',
    '8-h TWA 95 % CI high (mg/m³)',
    'Peak 15-min average (mg/m³)',
    'Peak 15-min 95 % CI low (mg/m³)',
    'Peak 15-min 95 % CI high (mg/m³)',
    'Short-term limit (mg/m³)',
    'Peak 15-min average against the short-term limit (% of limit)',
    'Limit (mg/m³)',
    '8-h TWA (% of limit)',
    '8-h TWA upper 95 % bound (% of limit)',
  ];
  const rows = FRACTIONS.map((f) => {
    const s = view.breathingZone.fractions[f];
    const l = view.limit?.fraction === f ? view.limit : undefined;
    return [
      FRACTION_LABEL[f],
      s.taskMean_mgPerM3,
      ...s.taskMeanCi95_mgPerM3,
      s.twa8h_mgPerM3,
      ...s.twa8hCi95_mgPerM3,
      s.peak15min_mgPerM3,
      s.peak15minCi95_mgPerM3?.[0] ?? '',
      s.peak15minCi95_mgPerM3?.[1] ?? '',
      l?.shortTerm?.value_mgPerM3 ?? '',
      l?.shortTerm?.percentOfLimit ?? '',
      l?.value_mgPerM3 ?? '',
      l?.percentOfLimit ?? '',
      l?.percentOfLimitUpper ?? '',
    ];
  });
  return toCsv(header, rows);
}

export function seriesCsv(view: RunResult): string {
  const header = [
    'Time (s)',
    ...FRACTIONS.flatMap((f) => [
      `${FRACTION_LABEL[f]} mean (mg/m³)`,
      `${FRACTION_LABEL[f]} 95 % CI low (mg/m³)`,
      `${FRACTION_LABEL[f]} 95 % CI high (mg/m³)`,
    ]),
  ];
  const series = view.breathingZone.series;
  const rows = series.time_s.map((t, i) => [t, ...FRACTIONS.flatMap((f) => [series[f].mean[i], series[f].lo[i], series[f].hi[i]])]);
  return toCsv(header, rows);
}
