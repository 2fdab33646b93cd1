import { ciText, percentText, upperBoundText } from '../../../../shared/format/index';
import { FRACTION_LABEL } from '../../../../shared/vocabulary/fraction-labels';
import { Link } from 'react-router-dom';
import { BannerBadge } from '@/components/banner-badge';
import { Button } from '@/components/ui/button';
import { type Column, DataTable, figureColumn } from '@/components/ui/data-table';
import { paths } from '@/config/paths';
import { downloadCsv, toCsv } from '@/lib/csv';
import { sig } from '@/lib/format';
import type { PointResult } from '@/features/sweep/lib/point-result';
import { formatValue, PARAMETER } from '@/features/sweep/lib/parameter-format';
import type { SweepParameter } from '@/features/sweep/lib/sweep-points';

export type TableRow = {
  index: number;
  value: number;
  result: PointResult;
  capture?: string;
  saved?: { id: number; name: string };
  saving?: boolean;
};

export function sweepCsv(rows: TableRow[], parameter: SweepParameter): string {
  const p = PARAMETER[parameter];
  const header = [
    'point',
    `${parameter}_${p.unit.replace(/\W+/g, '')}`,
    'fraction',
    'twa8h_mgPerM3',
    'twa8h_ci95_lo_mgPerM3',
    'twa8h_ci95_hi_mgPerM3',
    'percent_of_limit',
    'percent_of_limit_upper',
    'banner',
    'particles',
  ];
  return toCsv(
    header,
    rows.map((r) => [
      r.index + 1,
      p.fromSi(r.value),
      r.result.fraction,
      r.result.twa8h_mgPerM3,
      ...r.result.twa8hCi95_mgPerM3,
      r.result.percentOfLimit,
      r.result.percentOfLimitUpper,
      r.result.banner,
      r.result.particles,
    ]),
  );
}

export function SweepTable({
  rows,
  parameter,
  onSave,
  canSave,
}: {
  rows: TableRow[];
  parameter: SweepParameter;
  onSave: (row: TableRow) => void;
  canSave: boolean;
}) {
  // Every point is judged on the limit's fraction; the headers name it so TWA and % of limit read as one fraction.
  const fraction = rows[0] ? ` (${FRACTION_LABEL[rows[0].result.fraction].toLowerCase()})` : '';
  const columns: Column<TableRow>[] = [
    figureColumn({ key: 'index', header: 'Point', value: (r) => r.index, show: (i) => i + 1 }),
    figureColumn({ key: 'value', header: PARAMETER[parameter].label, value: (r) => r.value, show: (v) => formatValue(parameter, v) }),
    figureColumn({ key: 'twa', header: `8-h TWA${fraction} (mg/m³)`, value: (r) => r.result.twa8h_mgPerM3, show: sig }),
    {
      key: 'ci',
      header: '95 % CI (mg/m³)',
      render: (r) => ciText(r.result.twa8hCi95_mgPerM3, 3, '', sig),
      align: 'right',
    },
    figureColumn({ key: 'pct', header: `% of limit${fraction}`, value: (r) => r.result.percentOfLimit, show: percentText }),
    {
      key: 'upper',
      header: 'Upper 95 % (% of limit)',
      // No higher than the mean: the interval has no width, so the bound is not known.
      render: (r) => upperBoundText(r.result.percentOfLimit, r.result.percentOfLimitUpper, percentText),
      sortValue: (r) => r.result.percentOfLimitUpper,
      align: 'right',
    },
    {
      key: 'banner',
      header: 'Banner',
      render: (r) => <BannerBadge banner={r.result.banner} />,
      sortValue: (r) => ['clear', 'watch', 'act'].indexOf(r.result.banner),
    },
    {
      key: 'capture',
      header: 'Capture speed at the source (hand calculation)',
      render: (r) => <span className="text-xs">{r.capture ?? '—'}</span>,
    },
    {
      key: 'save',
      header: 'Keep',
      render: (r) =>
        r.saved ? (
          <Link className="font-semibold text-accent underline" to={paths.scenario(r.saved.id)}>
            Open “{r.saved.name}”
          </Link>
        ) : canSave ? (
          <Button variant="secondary" className="no-print px-2 py-1" disabled={r.saving} onClick={() => onSave(r)}>
            {r.saving ? 'Saving…' : 'Save as new scenario'}
          </Button>
        ) : null,
    },
  ];
  return (
    <section aria-labelledby="sweep-points-heading" className="space-y-2">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <h2 id="sweep-points-heading">Points</h2>
        <Button variant="secondary" onClick={() => downloadCsv(`motewalk-sweep-${parameter}.csv`, sweepCsv(rows, parameter))}>
          Download CSV
        </Button>
      </div>
      <DataTable rows={rows} columns={columns} rowKey={(r) => r.index} caption="Sweep points" initialSort={{ key: 'value', dir: 'asc' }} />
    </section>
  );
}
