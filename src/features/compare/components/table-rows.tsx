import { ciText, upperBoundKnown } from '../../../../shared/format/index';
import { controlTierLabel, FRACTION_LABEL } from '../../../../shared/vocabulary/index';
import type { ReactNode } from 'react';
import { BannerBadge } from '@/components/banner-badge';
import type { Fraction } from '../../../../shared/vocabulary/fractions';
import { compareMeans } from '@/features/compare/lib/differ';
import { roughFanPower_W } from '@/features/compare/lib/fan-power';
import { airflow_m3PerH, fanPowerText, hoodText, plain, share } from '@/features/compare/lib/labels';
import { estimateOf } from '@/features/compare/lib/reference';
import { meetsTarget, shortfall, type Target } from '@/features/compare/lib/target';
import { TABLE_FRACTIONS, type CompareColumn } from '@/features/compare/lib/types';

export interface RowSpec {
  key: string;
  label: ReactNode;
  /** Only for rows that read the run; a column without one says "not run". */
  needsRun?: boolean;
  cell: (c: CompareColumn, index: number) => ReactNode;
}

type Run = NonNullable<CompareColumn['run']>;
const run = (c: CompareColumn) => c.run as Run;
const mg = (v: number) => `${plain(v)} mg/m³`;
// A peak of nought under an interval with no width: no simulated dust reached the zone, so there is no peak to give.
const noPeak = (x: { peak15min_mgPerM3: number; twa8hCi95_mgPerM3: readonly [number, number] | number[] }) =>
  x.peak15min_mgPerM3 === 0 && x.twa8hCi95_mgPerM3[1] <= x.twa8hCi95_mgPerM3[0];
const Sub = ({ children }: { children: ReactNode }) => <span className="block text-xs text-muted">{children}</span>;

function differenceCell(columns: readonly CompareColumn[], c: CompareColumn, index: number, fraction: Fraction) {
  if (index === 0) return <span className="text-muted">Reference column</span>;
  const reference = estimateOf(columns[0], fraction);
  const own = estimateOf(c, fraction);
  if (!reference) return <span className="text-muted">First column not run</span>;
  if (!own) return <span className="text-muted">not run</span>;
  const d = compareMeans(reference, own);
  const sign = d.difference > 0 ? '+' : d.difference < 0 ? '−' : '';
  return (
    <>
      {sign}
      {mg(Math.abs(d.difference))} (
      {Number.isFinite(d.differencePercent) ? `${sign}${plain(Math.abs(d.differencePercent))} %` : 'first is zero'})
      <span className={`block font-semibold ${d.differs ? 'text-ink' : 'text-muted'}`}>
        <span aria-hidden="true">{Number.isNaN(d.z) ? '? ' : d.differs ? '≠ ' : '≈ '}</span>
        {d.statement}
      </span>
    </>
  );
}

export function tableRows(columns: readonly CompareColumn[], fraction: Fraction, target: Target): RowSpec[] {
  return [
    {
      key: 'workstation',
      label: 'Workstation',
      cell: (c) => (
        <>
          {c.workstationName}
          <Sub>{c.siteName}</Sub>
        </>
      ),
    },
    {
      key: 'control',
      label: 'Control',
      cell: (c) => (
        <>
          <span className="font-semibold">{controlTierLabel(c.controlTier)}</span>
          <Sub>{c.controlDescription || '—'}</Sub>
        </>
      ),
    },
    {
      key: 'hoods',
      label: 'Hoods',
      cell: (c) =>
        c.hoods.length ? (
          <ul className="space-y-1">
            {c.hoods.map((h, i) => (
              <li key={i}>{hoodText(h)}</li>
            ))}
          </ul>
        ) : (
          <span className="text-muted">None</span>
        ),
    },
    {
      key: 'capture',
      label: (
        <>
          Capture speed at the source<Sub>hand calculation against the release type&apos;s range</Sub>
        </>
      ),
      cell: (c) => c.capture ?? <span className="text-muted">No hood</span>,
    },
    { key: 'airflow', label: 'Total hood airflow', cell: (c) => `${Math.round(airflow_m3PerH(c.totalAirflow_m3PerS))} m³/h` },
    {
      key: 'fan',
      label: (
        <>
          Fan power<Sub>rough, common practice</Sub>
        </>
      ),
      cell: (c) => fanPowerText(roughFanPower_W(c.totalAirflow_m3PerS)),
    },
    ...TABLE_FRACTIONS.map<RowSpec>((f) => ({
      key: `twa-${f}`,
      label: (
        <>
          {FRACTION_LABEL[f]} 8-h TWA<Sub>95 % CI · peak 15-min average</Sub>
        </>
      ),
      needsRun: true,
      cell: (c) => {
        const x = run(c).fractions[f];
        return (
          <>
            {mg(x.twa8h_mgPerM3)}
            <Sub>
              CI {ciText(x.twa8hCi95_mgPerM3, 3, '', plain)} · peak {noPeak(x) ? 'not known' : mg(x.peak15min_mgPerM3)}
            </Sub>
          </>
        );
      },
    })),
    {
      key: 'percent',
      label: (
        <>
          % of limit<Sub>upper 95 % bound</Sub>
        </>
      ),
      needsRun: true,
      cell: (c) => {
        const l = run(c).limit;
        return l ? (
          <>
            {share(l.percentOfLimit / 100)}
            <Sub>
              {upperBoundKnown(l.percentOfLimit, l.percentOfLimitUpper)
                ? `up to ${share(l.percentOfLimitUpper / 100)} of ${mg(l.value_mgPerM3)}`
                : `of ${mg(l.value_mgPerM3)}, upper bound not known (no width),`}{' '}
              {FRACTION_LABEL[l.fraction].toLowerCase()}
            </Sub>
          </>
        ) : (
          'No limit set'
        );
      },
    },
    {
      key: 'rating',
      label: 'Exposure rating category',
      needsRun: true,
      cell: (c) => {
        const r = run(c);
        if (!r.limit) return '—';
        // With no width the upper bound, and so the daily 95th percentile the category rates, is not known.
        if (!upperBoundKnown(r.limit.percentOfLimit, r.limit.percentOfLimitUpper)) return 'Not rated (no width)';
        return `${r.limit.ratingCategory}${r.ratingName ? ` · ${r.ratingName}` : ''}`;
      },
    },
    {
      key: 'banner',
      label: 'Banner',
      cell: (c) =>
        c.run && !c.run.limit ? <span className="text-muted">No limit set</span> : <BannerBadge banner={c.run?.limit?.banner} />,
    },
    {
      key: 'fate',
      label: (
        <>
          Fate of the emitted mass<Sub>captured · settled · exhausted · airborne</Sub>
        </>
      ),
      needsRun: true,
      cell: (c) => {
        const s = run(c).fate.shares;
        return (
          <ul className="tabular-nums">
            <li>Captured {share(s.captured)}</li>
            <li>Settled {share(s.settled)}</li>
            <li>Exhausted {share(s.exhausted)}</li>
            <li>Airborne {share(s.airborne)}</li>
          </ul>
        );
      },
    },
    {
      key: 'difference',
      label: (
        <>
          Difference from the first column<Sub>{FRACTION_LABEL[fraction].toLowerCase()} 8-h TWA, absolute and %</Sub>
        </>
      ),
      cell: (c, i) => differenceCell(columns, c, i, fraction),
    },
    {
      key: 'target',
      label: (
        <>
          Meets the target<Sub>{target.label.toLowerCase()}</Sub>
        </>
      ),
      needsRun: true,
      cell: (c) =>
        meetsTarget(c, target) ? (
          <span>
            <span aria-hidden="true">✓ </span>Yes
          </span>
        ) : (
          <span>
            <span aria-hidden="true">✕ </span>No<Sub>{shortfall(c, target)}</Sub>
          </span>
        ),
    },
  ];
}
