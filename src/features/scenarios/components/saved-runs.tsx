import { countText, NO_WIDTH_TEXT, percentText } from '../../../../shared/format/index';
import { Link } from 'react-router-dom';
import type { RunListItem } from '../../../../shared/schemas/workspace-views';
import { BannerBadge } from '@/components/banner-badge';
import { DataTable, type Column } from '@/components/ui/data-table';
import { DownloadCsvButton } from '@/components/ui/download-csv-button';
import { EmptyState } from '@/components/ui/status';
import { SAVED_RUNS_HEADER, savedRunRow } from '@/features/scenarios/lib/saved-runs-csv';
import { paths } from '@/config/paths';
import { dateTime, sig } from '@/lib/format';
import { fractionWord } from '@/features/scenarios/lib/fraction-word';

const COLUMNS: Column<RunListItem>[] = [
  {
    key: 'when',
    header: 'Saved',
    sortValue: (r) => r.created_at,
    render: (r) => (
      <Link className="font-semibold text-accent underline" to={paths.run(r.id)}>
        {dateTime(r.created_at)}
      </Link>
    ),
  },
  {
    key: 'twa',
    header: "8-h TWA of the limit's fraction [95 % CI] (mg/m³)",
    align: 'right',
    sortValue: (r) => r.twa8h_mgPerM3,
    render: (r) => (
      <>
        {(r.twa8h_hi_mgPerM3 ?? 0) > (r.twa8h_lo_mgPerM3 ?? 0)
          ? `${sig(r.twa8h_mgPerM3)} [${sig(r.twa8h_lo_mgPerM3)}, ${sig(r.twa8h_hi_mgPerM3)}]`
          : `${sig(r.twa8h_mgPerM3)} [CI ${NO_WIDTH_TEXT}]`}
        <span className="block text-xs text-muted">{r.limit_fraction ? fractionWord(r.limit_fraction) : 'no limit set'}</span>
      </>
    ),
  },
  {
    key: 'pct',
    header: '% of limit',
    align: 'right',
    sortValue: (r) => r.percent_of_limit,
    render: (r) =>
      r.limit_fraction ? (
        <>
          {percentText(r.percent_of_limit)}
          <span className="block text-xs text-muted">{fractionWord(r.limit_fraction)}</span>
        </>
      ) : (
        <span className="text-muted">no limit set</span>
      ),
  },
  { key: 'banner', header: 'Banner', render: (r) => <BannerBadge banner={r.banner} /> },
  { key: 'particles', header: 'Particles', align: 'right', sortValue: (r) => r.particles, render: (r) => countText(r.particles) },
  { key: 'seed', header: 'Seed', render: (r) => <code className="text-xs">{r.seed}</code> },
  {
    key: 'state',
    header: 'Inputs',
    render: (r) =>
      r.outOfDate ? <span className="font-semibold text-watch">⟳ out of date</span> : <span className="text-clear">✓ current</span>,
  },
];

export function SavedRuns({ runs, scenarioName }: { runs: RunListItem[]; scenarioName?: string }) {
  if (!runs.length) return <EmptyState title="No saved runs yet">Run the scenario and save the run to keep its results.</EmptyState>;
  return (
    <div className="space-y-2">
      <DownloadCsvButton name={[scenarioName, 'saved runs']} header={SAVED_RUNS_HEADER} rows={() => runs.map(savedRunRow)} />
      <DataTable caption="Saved runs" rows={runs} columns={COLUMNS} rowKey={(r) => r.id} />
    </div>
  );
}
