import { FRACTIONS } from '../../../../workers/engine/types.ts';
import { FRACTION_LABEL } from '../../../../shared/vocabulary/index.ts';
import type { RunView } from './normalise-result.ts';

import { toCsv } from '../../../lib/csv.ts';

// Full precision in files: rounding is for the screen, the engineer's spreadsheet decides its own.

export function fractionTableCsv(view: RunView): string {
  const header = [
    'Fraction',
    'Task mean (mg/m³)',
    'Task mean 95 % CI low (mg/m³)',
    'Task mean 95 % CI high (mg/m³)',
    '8-h TWA (mg/m³)',
    '8-h TWA 95 % CI low (mg/m³)',
    '8-h TWA 95 % CI high (mg/m³)',
    'Peak 15-min average (mg/m³)',
    'Limit (mg/m³)',
    '8-h TWA (% of limit)',
    '8-h TWA upper 95 % bound (% of limit)',
  ];
  const rows = FRACTIONS.map((f) => {
    const s = view.fractions[f];
    const l = view.limit?.fraction === f ? view.limit : undefined;
    return [FRACTION_LABEL[f], s.taskMean_mgPerM3, ...s.taskMeanCi95_mgPerM3, s.twa8h_mgPerM3, ...s.twa8hCi95_mgPerM3, s.peak15min_mgPerM3, l?.value_mgPerM3 ?? '', l?.percentOfLimit ?? '', l?.percentOfLimitUpper ?? ''];
  });
  return toCsv(header, rows);
}

export function seriesCsv(view: RunView): string {
  const header = ['Time (s)', ...FRACTIONS.flatMap((f) => [`${FRACTION_LABEL[f]} mean (mg/m³)`, `${FRACTION_LABEL[f]} 95 % CI low (mg/m³)`, `${FRACTION_LABEL[f]} 95 % CI high (mg/m³)`])];
  const rows = view.series.time_s.map((t, i) => [t, ...FRACTIONS.flatMap((f) => [view.series.bands[f].mean[i], view.series.bands[f].lo[i], view.series.bands[f].hi[i]])]);
  return toCsv(header, rows);
}
