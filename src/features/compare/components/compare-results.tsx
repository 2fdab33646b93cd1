import { FRACTION_LABEL } from '../../../../shared/vocabulary/index';
import type { Fraction } from '../../../../shared/vocabulary/fractions';
import { Button } from '@/components/ui/button';
import { downloadCsv } from '@/lib/csv';
import { comparisonCsv } from '@/features/compare/lib/comparison-csv';
import { Z_CRITICAL } from '@/features/compare/lib/differ';
import { FAN_ASSUMPTIONS } from '@/features/compare/lib/fan-power';
import { airflow_m3PerH } from '@/features/compare/lib/labels';
import { comparedFraction } from '@/features/compare/lib/reference';
import { leastAirflowMeeting, type Target, type TargetId } from '@/features/compare/lib/target';
import { TABLE_FRACTIONS, type CompareColumn } from '@/features/compare/lib/types';
import { ComparisonTable } from './comparison-table';
import { FractionPicker } from '@/components/fraction-picker';
import { OverlayChart } from './overlay-chart';
import { TargetPicker } from './target-picker';

type Props = {
  columns: CompareColumn[];
  target: Target;
  onTargetChange: (id: TargetId) => void;
  chartFraction: Fraction | null;
  onChartFractionChange: (f: Fraction) => void;
};

export function CompareResults({ columns, target, onTargetChange, chartFraction, onChartFractionChange }: Props) {
  const fraction = comparedFraction(columns);
  const bestId = leastAirflowMeeting(columns, target);
  const best = columns.find((c) => c.id === bestId);
  const download = () => downloadCsv(`side-by-side-${columns.map((c) => c.id).join('-')}.csv`, comparisonCsv(columns, target));

  return (
    <>
      <div className="mb-3 flex flex-wrap items-end justify-between gap-4">
        <TargetPicker value={target} onChange={onTargetChange} />
        <Button variant="secondary" onClick={download}>
          Download CSV
        </Button>
      </div>
      <p role="status" className="mb-3 text-sm">
        {best ? (
          <>
            <strong>{best.name}</strong> meets the target with the least total hood airflow,{' '}
            {Math.round(airflow_m3PerH(best.totalAirflow_m3PerS))} m³/h.
          </>
        ) : (
          <>None of these options meets the target on its verdict.</>
        )}
      </p>
      {best?.controlTier === 'none' && (
        <p role="note" data-testid="no-control-meets" className="mb-3 rounded-md border border-watch bg-watch-soft p-3 text-sm text-ink">
          <span aria-hidden="true">! </span>
          <strong>{best.name}</strong> has no control, and it is the option that meets the target: as entered, the task reaches it without
          local exhaust. The columns still follow the hierarchy of controls, so it stands last. Check the emission and the room before
          deciding against a control, and confirm with personal air sampling.
        </p>
      )}
      <ComparisonTable columns={columns} fraction={fraction} target={target} bestId={bestId} />
      <ul className="mt-3 list-disc space-y-1 pl-5 text-xs text-muted">
        <li>
          Fan power is a rough, common-practice figure: P = Q·Δp/η with Δp = {FAN_ASSUMPTIONS.totalPressure_Pa} Pa total system pressure and
          η = {FAN_ASSUMPTIONS.efficiency} overall fan efficiency. Duct, filter and hood losses of the real system decide the fan.
        </li>
        <li>
          Differences are against the first column on the {FRACTION_LABEL[fraction].toLowerCase()} 8-h TWA. Two options differ beyond their
          statistical error when |z| &gt; {Z_CRITICAL}, the standard normal 97.5 % quantile (two-sided 5 % test), with z = difference /
          √(SE₁² + SE₂²) and each SE = 95 % CI half-width / {Z_CRITICAL}. Each pair is judged on its own; a pair where either interval is
          not known (too few particles reached the zone) is not judged.
        </li>
        <li>
          The target is judged as the banner is, on the verdict: the daily 95th percentile (from the upper 95 % bound of the 8-h TWA of the
          limit's fraction) must lie below it. A run that has not decided, or a hood below half its capture velocity, meets no target. Among
          options that meet it, the one with the least total hood airflow is marked.
        </li>
      </ul>
      <section aria-labelledby="chart-heading" className="mt-8">
        <div className="mb-3 flex flex-wrap items-center justify-between gap-3">
          <h2 id="chart-heading">Breathing-zone concentration</h2>
          <FractionPicker
            fractions={TABLE_FRACTIONS}
            legend="Size fraction in the chart"
            value={chartFraction ?? fraction}
            onChange={onChartFractionChange}
            limitFraction={fraction}
          />
        </div>
        <OverlayChart columns={columns} fraction={chartFraction ?? fraction} />
      </section>
    </>
  );
}
