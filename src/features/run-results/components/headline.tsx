import { countText, percentText, readableNumber, upperBoundKnown, upperBoundText } from '../../../../shared/format/index';
import type { ReactNode } from 'react';
import type { Scenario } from '../../../../shared/schemas/scenario';
import { CaptureVerdict } from '@/components/capture-verdict';
import { BANNER_LABEL, FRACTION_LABEL, RATING_LABEL } from '../../../../shared/vocabulary/index';
import { BANNER_CLASSES, BannerBadge } from '@/components/banner-badge';
import { ciText, relativeError } from '@/features/run-results/lib/format';
import type { RunResult } from '../../../../shared/schemas/run-result';
import { PeakText } from './peak-figure';
import { RunMore } from './run-more';

function Figure({ label, children, testId }: { label: string; children: ReactNode; testId?: string }) {
  return (
    <div className="rounded-lg border border-line bg-white p-3">
      <dt className="text-xs font-semibold text-muted">{label}</dt>
      <dd className="mt-1 text-lg font-semibold tabular-nums" data-testid={testId}>
        {children}
      </dd>
    </div>
  );
}

// An error that is not a positive number (no dust in the zone, an interval with no width) is not known, never "± 0 %".
const errorText = (relative_pct: number, looks: string) =>
  relative_pct > 0 && Number.isFinite(relative_pct) ? `± ${readableNumber(relative_pct, 2)} % at 95 % confidence${looks}` : 'Not known';

export function Headline({
  view,
  scenario,
  agentName,
  limitSource,
}: {
  view: RunResult;
  scenario: Scenario;
  agentName?: string;
  limitSource?: string;
}) {
  const limit = view.limit;
  const fraction = limit?.fraction ?? 'respirable';
  const s = view.breathingZone.fractions[fraction];
  const agent = agentName ?? scenario.dust.name;
  const source = limitSource ?? scenario.limit?.source;
  return (
    <div>
      {limit ? (
        <div
          className={`flex flex-wrap items-center gap-4 rounded-lg border p-4 ${BANNER_CLASSES[limit.banner].border} ${BANNER_CLASSES[limit.banner].soft}`}
        >
          <BannerBadge banner={limit.banner} size="lg" />
          <p className="max-w-xl text-sm text-ink">
            {BANNER_LABEL[limit.banner].meaning} ({readableNumber(limit.value_mgPerM3)} mg/m³ {FRACTION_LABEL[limit.fraction].toLowerCase()}
            {agent ? ` for ${agent}` : ''}
            {/* A source that ends its own sentence would close as ").)." */}
            {source ? `, ${source.replace(/\.\s*$/, '')}` : ''}).
          </p>
          {limit.reasons && limit.reasons.length > 0 && (
            <ul role="status" data-testid="verdict-reasons" className="w-full list-disc pl-5 text-sm font-semibold text-ink">
              {limit.reasons.map((reason) => (
                <li key={reason}>{reason}</li>
              ))}
            </ul>
          )}
          <div className="w-full">
            <RunMore view={view} />
          </div>
        </div>
      ) : (
        <p role="note" className="rounded-lg border border-line bg-paper-deep p-4 text-sm">
          <span aria-hidden="true">○ </span>This scenario has no exposure limit, so there is no Clear / Watch / Act banner and no % of
          limit; concentrations only.
        </p>
      )}
      <div className="mt-3">
        <CaptureVerdict scenario={scenario} />
      </div>
      <dl className="mt-4 grid grid-cols-1 gap-3 sm:grid-cols-2 lg:grid-cols-5">
        <Figure label={`8-h TWA, ${FRACTION_LABEL[fraction].toLowerCase()}`} testId="twa">
          {readableNumber(s.twa8h_mgPerM3)} mg/m³
          <span className="block text-xs font-normal text-muted">95 % CI {ciText(s.twa8hCi95_mgPerM3, 3, ' mg/m³')}</span>
        </Figure>
        {limit && (
          <Figure label="Share of the limit" testId="percent-of-limit">
            {percentText(limit.percentOfLimit)}
            <span className="block text-xs font-normal text-muted">
              upper 95 % bound {upperBoundText(limit.percentOfLimit, limit.percentOfLimitUpper, percentText)}
            </span>
          </Figure>
        )}
        {limit && (
          <Figure label="Exposure rating category" testId="rating">
            {upperBoundKnown(limit.percentOfLimit, limit.percentOfLimitUpper) ? (
              <>
                {limit.ratingCategory} · {RATING_LABEL[limit.ratingCategory].name}
                <span className="block text-xs font-normal text-muted">
                  AIHA band: {RATING_LABEL[limit.ratingCategory].band}
                  {limit.p95_mgPerM3 !== undefined &&
                    `; daily 95th percentile ${readableNumber(limit.p95_mgPerM3)} mg/m³ at a day-to-day GSD of ${readableNumber(limit.gsd ?? NaN, 2)}`}
                </span>
              </>
            ) : (
              <>
                Not rated
                <span className="block text-xs font-normal text-muted">
                  The interval has no upper bound above its mean, so the daily 95th percentile is not known.
                </span>
              </>
            )}
          </Figure>
        )}
        <Figure label={`Peak 15-min average, ${FRACTION_LABEL[fraction].toLowerCase()}`} testId="peak">
          <PeakText summary={s} limit={limit} unit=" mg/m³" />
        </Figure>
        <Figure label="Statistical error" testId="statistical-error">
          {errorText(relativeError(s.taskMean_mgPerM3, s.taskMeanCi95_mgPerM3), view.engine.stopping ? ' over all looks' : '')}
          <span className="block text-xs font-normal text-muted">
            {countText(view.engine.particles)} particles in {view.engine.batches} batches
          </span>
        </Figure>
      </dl>
      <p className="mt-2 text-xs text-muted">
        Engine {view.engine.version}, seed {String(view.engine.seed)}. The error is the half-width of the 95 % interval across batches,
        relative to the {FRACTION_LABEL[fraction].toLowerCase()} task mean; more particles narrow it.
      </p>
    </div>
  );
}
