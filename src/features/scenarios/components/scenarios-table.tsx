import { percentText } from '../../../../shared/format/index';
import { Link } from 'react-router-dom';
import type { ScenarioSummary } from '../../../../shared/schemas/workspace-views';
import { BannerBadge } from '@/components/banner-badge';
import { Button } from '@/components/ui/button';
import { DataTable, type Column, type TableSort } from '@/components/ui/data-table';
import { EmptyState, ErrorMessage, Spinner } from '@/components/ui/status';
import { paths } from '@/config/paths';
import { downloadCsv, toCsv } from '@/lib/csv';
import { dateTime, sig } from '@/lib/format';
import { useScenarios, type ScenarioFilters } from '@/features/scenarios/api/get-scenarios';
import { fractionWord } from '@/features/scenarios/lib/fraction-word';

// Both figures are of the limit's own fraction, named under each, so a respirable TWA never sits beside a % of an inhalable limit.
function FractionFigure({ run, figure }: { run: ScenarioSummary['lastRun']; figure: string }) {
  if (!run) return <span className="text-muted">not run</span>;
  if (!run.limitFraction) return <span className="text-muted">no limit set</span>;
  return (
    <>
      {figure}
      <span className="block text-xs text-muted">{fractionWord(run.limitFraction)}</span>
    </>
  );
}

const COLUMNS: Column<ScenarioSummary>[] = [
  {
    key: 'name',
    header: 'Scenario',
    sortValue: () => 0,
    render: (s) => (
      <Link className="font-semibold text-accent underline" to={paths.scenario(s.id)}>
        {s.name}
      </Link>
    ),
  },
  {
    key: 'workstation',
    header: 'Workstation',
    sortValue: () => 0,
    render: (s) => (
      <Link className="hover:underline" to={paths.workstation(s.workstationId)}>
        {s.workstationName}
      </Link>
    ),
  },
  { key: 'site', header: 'Site', sortValue: () => 0, render: (s) => s.siteName },
  { key: 'agent', header: 'Dust agent', sortValue: () => 0, render: (s) => s.agentName ?? '—' },
  {
    key: 'status',
    header: 'Status',
    sortValue: () => 0,
    render: (s) =>
      s.status === 'approved' ? (
        <span>★ Approved{s.needsReview && <span className="block text-xs font-semibold text-watch">⟳ needs review</span>}</span>
      ) : (
        'Draft'
      ),
  },
  {
    key: 'twa',
    header: "8-h TWA of the limit's fraction (mg/m³)",
    align: 'right',
    sortValue: () => 0,
    render: (s) => <FractionFigure run={s.lastRun} figure={sig(s.lastRun?.twa8h_mgPerM3)} />,
  },
  {
    key: 'percentOfLimit',
    header: '% of limit',
    align: 'right',
    sortValue: () => 0,
    render: (s) => <FractionFigure run={s.lastRun} figure={percentText(s.lastRun?.percentOfLimit)} />,
  },
  {
    key: 'banner',
    header: 'Banner',
    sortValue: () => 0,
    render: (s) => (
      <span className="inline-flex items-center gap-2">
        <BannerBadge banner={s.lastRun?.banner} />
        {s.lastRun?.decided === false && (
          <span className="text-xs font-semibold text-watch" title={s.lastRun.reasons.join(' ')}>
            ? not decided
          </span>
        )}
        {s.lastRun?.outOfDate && <span className="text-xs font-semibold text-watch">⟳ out of date</span>}
      </span>
    ),
  },
  { key: 'updatedAt', header: 'Changed', sortValue: () => 0, render: (s) => dateTime(s.updatedAt) },
];

function exportCsv(rows: ScenarioSummary[]) {
  const header = [
    'scenario',
    'workstation',
    'site',
    'dust_agent',
    'status',
    'control',
    'respirable_twa8h_mg_per_m3',
    'limit_fraction',
    'twa8h_mg_per_m3',
    'twa8h_ci95_lo',
    'twa8h_ci95_hi',
    'percent_of_limit',
    'banner',
    'run_out_of_date',
    'changed_at',
  ];
  const body = rows.map((s) => [
    s.name,
    s.workstationName,
    s.siteName,
    s.agentName,
    s.status,
    s.controlDescription,
    s.lastRun?.respirableTwa8h_mgPerM3,
    s.lastRun?.limitFraction,
    s.lastRun?.twa8h_mgPerM3,
    s.lastRun?.twa8hCi95_mgPerM3[0],
    s.lastRun?.twa8hCi95_mgPerM3[1],
    s.lastRun?.percentOfLimit,
    s.lastRun?.banner,
    s.lastRun ? String(s.lastRun.outOfDate) : '',
    s.updatedAt,
  ]);
  downloadCsv('motewalk-scenarios.csv', toCsv(header, body));
}

type Props = {
  filters: ScenarioFilters;
  onSortChange: (s: TableSort) => void;
  /** What an empty list says: the page knows whether it offers filters and how a scenario is added there. */
  empty: { title: string; hint: string };
};

export function ScenariosTable({ filters, onSortChange, empty }: Props) {
  const query = useScenarios({ pageSize: 200, ...filters });
  if (query.isPending) return <Spinner label="Loading scenarios…" />;
  if (query.error) return <ErrorMessage error={query.error} />;
  const rows = query.data.items;
  return (
    <div className="space-y-2">
      <div className="flex items-center justify-between text-sm text-muted">
        <span aria-live="polite">
          {query.data.total} scenario{query.data.total === 1 ? '' : 's'}
          {query.isFetching ? ' · updating…' : ''}
        </span>
        <Button variant="secondary" onClick={() => exportCsv(rows)} disabled={!rows.length}>
          Download CSV
        </Button>
      </div>
      {rows.length ? (
        <DataTable
          caption="Scenarios"
          rows={rows}
          columns={COLUMNS}
          rowKey={(s) => s.id}
          sort={{ key: filters.sort ?? 'updatedAt', dir: filters.order ?? 'desc' }}
          onSortChange={onSortChange}
        />
      ) : (
        <EmptyState title={empty.title}>{empty.hint}</EmptyState>
      )}
    </div>
  );
}
