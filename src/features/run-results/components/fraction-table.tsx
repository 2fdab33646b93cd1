import { percentText, readableNumber, upperBoundText } from '../../../../shared/format/index';
import { Button } from '@/components/ui/button';
import { type Column, DataTable } from '@/components/ui/data-table';
import { FRACTIONS, type Fraction } from '../../../../shared/vocabulary/fractions';
import { fractionTableCsv, seriesCsv } from '@/features/run-results/lib/csv';
import { downloadText } from '@/lib/download';
import { FRACTION_LABEL } from '../../../../shared/vocabulary/index';
import { ciText } from '@/features/run-results/lib/format';
import type { FractionSummary, ResultLimit, RunResult } from '../../../../shared/schemas/run-result';
import { PeakText } from './peak-figure';
import { Section } from './section';

type Row = FractionSummary & { fraction: Fraction; percent?: number; percentUpper?: number; limit?: ResultLimit };

const withCi = (value: number, ci: [number, number]) => (
  <>
    {readableNumber(value)}
    <span className="block text-xs text-muted">{ciText(ci)}</span>
  </>
);

const COLUMNS: Column<Row>[] = [
  { key: 'fraction', header: 'Fraction', render: (r) => FRACTION_LABEL[r.fraction], sortValue: (r) => FRACTIONS.indexOf(r.fraction) },
  {
    key: 'task',
    header: 'Task mean (mg/m³, 95 % CI)',
    align: 'right',
    render: (r) => withCi(r.taskMean_mgPerM3, r.taskMeanCi95_mgPerM3),
    sortValue: (r) => r.taskMean_mgPerM3,
  },
  {
    key: 'twa',
    header: '8-h TWA (mg/m³, 95 % CI)',
    align: 'right',
    render: (r) => withCi(r.twa8h_mgPerM3, r.twa8hCi95_mgPerM3),
    sortValue: (r) => r.twa8h_mgPerM3,
  },
  {
    key: 'peak',
    header: 'Peak 15-min average (mg/m³, 95 % CI)',
    align: 'right',
    render: (r) => <PeakText summary={r} limit={r.limit} />,
    sortValue: (r) => r.peak15min_mgPerM3,
  },
  {
    key: 'percent',
    header: '% of limit (upper 95 %)',
    align: 'right',
    render: (r) =>
      r.percent === undefined ? (
        <span className="text-muted" title="The limit applies to another fraction">
          —
        </span>
      ) : (
        <>
          {percentText(r.percent)}
          <span className="block text-xs text-muted">
            {upperBoundText(r.percent, r.percentUpper ?? NaN, (v) => `up to ${percentText(v)}`)}
          </span>
        </>
      ),
    sortValue: (r) => r.percent ?? null,
  },
];

export function FractionTable({ view, fileName }: { view: RunResult; fileName: (what: string) => string }) {
  const rows: Row[] = FRACTIONS.map((f) => ({
    fraction: f,
    ...view.breathingZone.fractions[f],
    ...(view.limit?.fraction === f
      ? { percent: view.limit.percentOfLimit, percentUpper: view.limit.percentOfLimitUpper, limit: view.limit }
      : {}),
  }));
  const actions = (
    <>
      <Button variant="secondary" onClick={() => downloadText(fileName('fractions'), fractionTableCsv(view))}>
        <span aria-hidden="true">↓</span> Download CSV
      </Button>
      <Button variant="secondary" onClick={() => downloadText(fileName('time series'), seriesCsv(view))}>
        <span aria-hidden="true">↓</span> Download time series CSV
      </Button>
    </>
  );
  return (
    <Section
      title="Concentrations by size fraction"
      intro={
        <>
          Task mean over the simulated window; the 8-h TWA adds the rest of the shift at background.{' '}
          <span className="no-print">Select a column heading to sort.</span>
        </>
      }
      actions={actions}
    >
      <DataTable
        rows={rows}
        columns={COLUMNS}
        rowKey={(r) => r.fraction}
        caption="Breathing-zone concentrations by size fraction"
        initialSort={{ key: 'fraction', dir: 'asc' }}
      />
    </Section>
  );
}
