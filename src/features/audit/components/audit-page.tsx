import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { DataTable, type Column } from '@/components/ui/data-table';
import { SelectField, TextField } from '@/components/ui/field';
import { Page } from '@/components/ui/page';
import { EmptyState, ErrorMessage, Spinner } from '@/components/ui/status';
import { dateTimeText } from '../../../../shared/format/index';
import { downloadTable } from '@/lib/csv';
import { useAudit, type AuditEntry, type AuditFilters } from '@/features/audit/api/get-audit';
import { ACTION_LABEL, actionLabel, actorWords, auditSentence, changesOf, deedWords } from '@/features/audit/lib/audit-sentence';

const ACTIONS = Object.keys(ACTION_LABEL);

const COLUMNS: Column<AuditEntry>[] = [
  { key: 'when', header: 'When', render: (a) => dateTimeText(a.createdAt), sortValue: (a) => a.createdAt },
  {
    key: 'who',
    header: 'Who',
    render: (a) => (
      <>
        {actorWords(a)}
        {a.actorEmail && a.actorName && <span className="block text-xs text-muted">{a.actorEmail}</span>}
      </>
    ),
    sortValue: (a) => actorWords(a).toLowerCase(),
  },
  {
    key: 'what',
    header: 'What happened',
    render: (a) => {
      const changes = changesOf(a);
      return (
        <>
          <span className="block first-letter:uppercase">{deedWords(a)}</span>
          {changes.length > 0 && (
            <ul aria-label="What changed" className="mt-1 list-disc pl-5 text-xs text-muted">
              {changes.map((c) => (
                <li key={c}>{c}</li>
              ))}
            </ul>
          )}
        </>
      );
    },
    sortValue: (a) => actionLabel(a.action),
  },
];

export function AuditPage({ workstations }: { workstations: { id: number; name: string }[] }) {
  const [f, setF] = useState<AuditFilters>({});
  const audit = useAudit(f);
  const rows = audit.data?.items ?? [];
  const exportCsv = () =>
    downloadTable(
      ['audit trail'],
      ['When (ISO 8601, UTC)', 'Who', 'E-mail', 'Action', 'What happened', 'What changed'],
      rows.map((a) => [a.createdAt, actorWords(a), a.actorEmail, actionLabel(a.action), auditSentence(a), changesOf(a).join('; ')]),
    );
  return (
    <Page title="Audit trail" intro="Who created, changed, ran, approved and shared what, and when. Newest first.">
      <div role="search" aria-label="Filter the audit trail" className="mb-4 grid gap-3 sm:grid-cols-4">
        <TextField
          label="Person (name)"
          value={f.actor ?? ''}
          onChange={(e) => setF({ ...f, actor: e.target.value.trim() || undefined })}
        />
        <SelectField label="Action" value={f.action ?? ''} onChange={(e) => setF({ ...f, action: e.target.value || undefined })}>
          <option value="">Any action</option>
          {ACTIONS.map((a) => (
            <option key={a} value={a}>
              {ACTION_LABEL[a]}
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
