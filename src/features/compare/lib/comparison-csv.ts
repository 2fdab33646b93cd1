import { controlTierLabel, FATES, FRACTION_LABEL } from '../../../../shared/vocabulary/index';
import { toCsv } from '@/lib/csv';
import { compareMeans } from './differ';
import { roughFanPower_W } from './fan-power';
import { airflow_m3PerH, hoodText } from './labels';
import { leastAirflowMeeting, meetsTarget, type Target } from './target';
import { TABLE_FRACTIONS, type CompareColumn } from './types';
import { comparedFraction, estimateOf } from './reference';

/** One row per scenario, raw numbers with units in the header, so a spreadsheet can compute with them. */
export function comparisonCsv(columns: readonly CompareColumn[], target: Target): string {
  const fraction = comparedFraction(columns);
  const best = leastAirflowMeeting(columns, target);
  const header = [
    'Scenario',
    'Workstation',
    'Site',
    'Control tier',
    'Control',
    'Hoods',
    'Capture speed at the source (hand calculation)',
    'Total hood airflow (m³/h)',
    'Rough fan power (W)',
    ...TABLE_FRACTIONS.flatMap((f) => [
      `${FRACTION_LABEL[f]} 8-h TWA (mg/m³)`,
      `${FRACTION_LABEL[f]} 8-h TWA lower 95 % (mg/m³)`,
      `${FRACTION_LABEL[f]} 8-h TWA upper 95 % (mg/m³)`,
      `${FRACTION_LABEL[f]} peak 15-min (mg/m³)`,
    ]),
    'Limit fraction',
    'Limit (mg/m³)',
    '% of limit',
    '% of limit upper 95 %',
    'Exposure rating category',
    'Rating',
    'Banner',
    ...FATES.map((k) => `${k[0].toUpperCase()}${k.slice(1)} (% of emitted)`),
    `${FRACTION_LABEL[fraction]} 8-h TWA difference from first (mg/m³)`,
    'Difference from first (%)',
    'z',
    'Beyond statistical error',
    `Meets target: ${target.label}`,
    'Least airflow meeting target',
  ];
  const reference = columns[0] ? estimateOf(columns[0], fraction) : null;
  const rows = columns.map((c, i) => {
    const r = c.run;
    const own = estimateOf(c, fraction);
    const diff = i > 0 && reference && own ? compareMeans(reference, own) : null;
    return [
      c.name,
      c.workstationName,
      c.siteName,
      controlTierLabel(c.controlTier),
      c.controlDescription,
      c.hoods.map(hoodText).join('; '),
      c.capture ?? '',
      airflow_m3PerH(c.totalAirflow_m3PerS),
      roughFanPower_W(c.totalAirflow_m3PerS),
      ...TABLE_FRACTIONS.flatMap((f) =>
        r
          ? [
              r.fractions[f].twa8h_mgPerM3,
              r.fractions[f].twa8hCi95_mgPerM3[0],
              r.fractions[f].twa8hCi95_mgPerM3[1],
              r.fractions[f].peak15min_mgPerM3,
            ]
          : [null, null, null, null],
      ),
      r?.limit?.fraction,
      r?.limit?.value_mgPerM3,
      r?.limit?.percentOfLimit,
      r?.limit?.percentOfLimitUpper,
      r?.limit?.ratingCategory,
      r?.ratingName,
      r?.limit ? r.limit.banner : r ? 'No limit' : 'Not run',
      ...FATES.map((k) => (r ? 100 * r.fate.shares[k] : '')),
      diff?.difference,
      diff?.differencePercent,
      diff && Number.isFinite(diff.z) ? diff.z : '',
      diff ? (Number.isNaN(diff.z) ? 'not known' : diff.differs ? 'yes' : 'no') : '',
      r ? (meetsTarget(c, target) ? 'yes' : 'no') : '',
      best === c.id ? 'yes' : 'no',
    ];
  });
  return toCsv(header, rows);
}
