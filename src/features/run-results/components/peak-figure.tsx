import { percentText, readableNumber } from '../../../../shared/format/index';
import type { FractionSummary, ResultLimit } from '../../../../shared/schemas/run-result';
import { ciText } from '@/features/run-results/lib/format';

const EXCEEDS = { no: 'below', maybe: 'possibly above', yes: 'above' } as const;

/**
 * The peak 15-min average with its interval, and against the short-term limit where the agent has one. When no
 * simulated dust reached the zone there is no peak to give: it reads "Not known", never a peak of 0 mg/m³.
 */
export function PeakText({ summary, limit, unit = '' }: { summary: FractionSummary; limit?: ResultLimit; unit?: string }) {
  const st = limit?.shortTerm;
  const none = summary.zoneHistories === 0;
  return (
    <>
      {none ? (
        'Not known'
      ) : (
        <>
          {readableNumber(summary.peak15min_mgPerM3)}
          {unit}
        </>
      )}
      {summary.peak15minCi95_mgPerM3 && <span className="block text-xs text-muted">{ciText(summary.peak15minCi95_mgPerM3, 3, unit)}</span>}
      {st && (
        <span className="block text-xs" data-testid="short-term">
          {percentText(st.percentOfLimit)} of the 15-min limit {readableNumber(st.value_mgPerM3)} mg/m³ (up to{' '}
          {percentText(st.percentOfLimitUpper)}): {EXCEEDS[st.exceeds]}
        </span>
      )}
    </>
  );
}
