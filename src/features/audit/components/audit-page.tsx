import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { DataTable, type Column } from '@/components/ui/data-table';
import { SelectField, TextField } from '@/components/ui/field';
import { Page } from '@/components/ui/page';
import { EmptyState, ErrorMessage, Spinner } from '@/components/ui/status';
import { downloadCsv, toCsv } from '@/lib/csv';
import { dateTime } from '@/lib/format';
import { useAudit, type AuditEntry, type AuditFilters } from '@/features/audit/api/get-audit';

const ACTIONS = [
  'auth.signed_in',
  'auth.sign_in_failed',
  'person.invited',
  'person.role_changed',
  'person.deactivated',
  'site.created',
  'room.created',
  'workstation.created',
  'workstation.changed',
  'workstation.operators_assigned',
  'agent.created',
  'agent.changed',
  'agent.limit_overridden',
  'size_profile.created',
  'size_profile.deleted',
  'scenario.created',
  'scenario.changed',
  'scenario.deleted',
  'run.saved',
  'scenario.approved',
  'report.shared',
];

const detail = (d: AuditEntry['detail']) =>
  d
    ? Object.entries(d)
        .map(([k, v]) => `${k}: ${typeof v === 'object' ? JSON.stringify(v) : String(v)}`)
        .join('; ')
    : '';

const COLUMNS: Column<AuditEntry>[] = [
  { key: 'when', header: 'When', render: (a) => dateTime(a.createdAt), sortValue: (a) => a.createdAt },
  { key: 'who', header: 'Who', render: (a) => a.actorEmail ?? '—', sortValue: (a) => a.actorEmail ?? '' },
  { key: 'action', header: 'What', render: (a) => <code className="text-xs">{a.action}</code>, sortValue: (a) => a.action },
  {
    key: 'target',
    header: 'On',
    render: (a) => (a.targetType ? `${a.targetType} ${a.targetId}` : '—'),
    sortValue: (a) => `${a.targetType}${a.targetId}`,
  },
  { key: 'detail', header: 'Detail', render: (a) => <span className="text-xs text-muted">{detail(a.detail)}</span> },
];

export function AuditPage({ workstations }: { workstations: { id: number; name: string }[] }) {
  const [f, setF] = useState<AuditFilters>({});
  const audit = useAudit(f);
  const rows = audit.data?.items ?? [];
  const exportCsv = () =>
    downloadCsv(
      'motewalk-audit.csv',
      toCsv(
        ['when', 'who', 'action', 'target_type', 'target_id', 'detail'],
        rows.map((a) => [a.createdAt, a.actorEmail, a.action, a.targetType, a.targetId, detail(a.detail)]),
      ),
    );
  return (
    <Page title="Audit trail" intro="Who created, changed, ran, approved and shared what, and when. Newest first.">
      <div role="search" aria-label="Filter the audit trail" className="mb-4 grid gap-3 sm:grid-cols-4">
        <TextField
          label="Person (e-mail)"
          value={f.actor ?? ''}
          onChange={(e) => setF({ ...f, actor: e.target.value.trim() || undefined })}
        />
        <SelectField label="Action" value={f.action ?? ''} onChange={(e) => setF({ ...f, action: e.target.value || undefined })}>
          <option value="">Any action</option>
          {ACTIONS.map((a) => (
            <option key={a} value={a}>
              {a}
            </option>
          ))}
        </SelectField>
        <SelectField
          label="Workstation"
          value={f.workstationId ?? ''}
          onChange={(e) => setF({ ...f, workstationId: e.target.value ? Number(e.target.value) : undefined })}
        >
          <option value="">Any workstation</option>
          {workstations.map((w) => (
            <option key={w.id} value={w.id}>
              {w.name}
            </option>
          ))}
        </SelectField>
        <Button variant="secondary" className="self-end" onClick={exportCsv} disabled={!rows.length}>
          Download CSV
        </Button>
      </div>
      {audit.isPending && <Spinner />}
      {audit.error && <ErrorMessage error={audit.error} />}
      {audit.data &&
        (rows.length ? (
          <DataTable caption="Audit trail" rows={rows} columns={COLUMNS} rowKey={(a) => a.id} />
        ) : (
          <EmptyState title="No entries match these filters" />
        ))}
      {audit.data && audit.data.total > rows.length && (
        <p className="mt-2 text-xs text-muted">
          Showing the newest {rows.length} of {audit.data.total}; narrow the filters to see older entries.
        </p>
      )}
    </Page>
  );
}
