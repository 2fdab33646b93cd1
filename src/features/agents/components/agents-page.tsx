import { useState } from 'react';
import type { AgentRecord } from '../../../../shared/schemas/workspace-views';
import { Can } from '@/components/can';
import { Button } from '@/components/ui/button';
import { DataTable, type Column } from '@/components/ui/data-table';
import { DownloadCsvButton } from '@/components/ui/download-csv-button';
import { Page } from '@/components/ui/page';
import { AGENTS_HEADER, agentRow } from '@/features/agents/lib/agents-csv';
import { ErrorMessage, Spinner } from '@/components/ui/status';
import { sig } from '@/lib/format';
import { useAgents } from '@/features/agents/api/get-agents';
import { AgentForm } from './agent-form';

export function AgentsPage() {
  const agents = useAgents();
  const [editing, setEditing] = useState<number | null>(null);
  const columns: Column<AgentRecord>[] = [
    { key: 'name', header: 'Dust agent', render: (a) => a.name, sortValue: (a) => a.name },
    { key: 'fraction', header: 'Limit applies to', render: (a) => a.data.limitFraction, sortValue: (a) => a.data.limitFraction },
    {
      key: 'limit',
      header: '8-h limit (mg/m³)',
      align: 'right',
      render: (a) =>
        a.data.override ? (
          <span title={`Override: ${a.data.override.reason}`}>
            {sig(a.data.override.limit8h_mgPerM3)}{' '}
            <span className="text-xs text-watch">override (published {sig(a.data.limit8h_mgPerM3)})</span>
          </span>
        ) : (
          sig(a.data.limit8h_mgPerM3)
        ),
      sortValue: (a) => a.data.override?.limit8h_mgPerM3 ?? a.data.limit8h_mgPerM3,
    },
    { key: 'stel', header: '15-min (mg/m³)', align: 'right', render: (a) => sig(a.data.limit15min_mgPerM3) },
    {
      key: 'where',
      header: 'Jurisdiction and source',
      render: (a) => (
        <span className="text-xs">
          {a.data.jurisdiction}: {a.data.limitSource}
          {a.data.limitDate ? ` (${a.data.limitDate})` : ''}
        </span>
      ),
    },
    {
      key: 'density',
      header: 'Density (kg/m³)',
      align: 'right',
      render: (a) => a.data.density_kgPerM3,
      sortValue: (a) => a.data.density_kgPerM3,
    },
    {
      key: 'edit',
      header: '',
      render: (a) => (
        <Can permission="scenarios:write">
          <Button variant="ghost" className="px-2 py-1 text-xs" onClick={() => setEditing(a.id)}>
            Edit
          </Button>
        </Can>
      ),
    },
  ];
  const current = agents.data?.items.find((a) => a.id === editing);
  return (
    <Page
      title="Dust agents"
      intro="Materials with their exposure limits. Every limit carries where it applies, its source and date; an override needs a reason and is recorded in the audit trail."
    >
      {agents.isPending && <Spinner />}
      {agents.error && <ErrorMessage error={agents.error} />}
      {agents.data && (
        <DataTable caption="Dust agents" rows={agents.data.items} columns={columns} initialSort={{ key: 'name', dir: 'asc' }} />
      )}
      {agents.data && (
        <div className="mt-2">
          <DownloadCsvButton name={['dust agents']} header={AGENTS_HEADER} rows={() => agents.data.items.map(agentRow)} />
        </div>
      )}
      <p className="mt-2 text-xs text-muted">
        Limits differ by country and change over time: confirm the one in force where the work is done.
      </p>
      <Can permission="scenarios:write">
        <section className="mt-8 space-y-3">
          <h2>{current ? `Edit ${current.name}` : 'Add a dust agent'}</h2>
          {current ? <AgentForm key={current.id} agent={current} onDone={() => setEditing(null)} /> : <AgentForm />}
        </section>
      </Can>
    </Page>
  );
}
