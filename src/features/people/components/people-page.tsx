import { dateTimeText } from '../../../../shared/format/index';
import { ROLES, ROLE_LABELS, type Role } from '../../../../shared/auth/permissions';
import type { Person } from '../../../../shared/schemas/auth';
import { Button } from '@/components/ui/button';
import { DataTable, type Column } from '@/components/ui/data-table';
import { DownloadCsvButton } from '@/components/ui/download-csv-button';
import { Page } from '@/components/ui/page';
import { PEOPLE_HEADER, personRow } from '@/features/people/lib/people-csv';
import { EmptyState, ErrorMessage, Notice, Spinner } from '@/components/ui/status';
import { useUser } from '@/lib/auth';
import { usePeople } from '@/features/people/api/get-people';
import { useSendPasswordLink } from '@/features/people/api/send-password-link';
import { useUpdatePerson } from '@/features/people/api/update-person';
import { InviteForm } from './invite-form';

const STATUS_TEXT: Record<Person['status'], string> = { invited: '✉ Invited', active: '● Active', deactivated: '⊘ Deactivated' };

export function PeoplePage() {
  const people = usePeople();
  const me = useUser().data;
  const update = useUpdatePerson();
  const link = useSendPasswordLink();

  const columns: Column<Person>[] = [
    { key: 'name', header: 'Name', render: (p) => p.name, sortValue: (p) => p.name.toLowerCase() },
    { key: 'email', header: 'E-mail', render: (p) => p.email, sortValue: (p) => p.email },
    {
      key: 'role',
      header: 'Role',
      sortValue: (p) => p.role,
      render: (p) => (
        <select
          aria-label={`Role of ${p.name}`}
          value={p.role}
          disabled={p.id === me?.id || update.isPending}
          onChange={(e) => update.mutate({ id: p.id, patch: { role: e.target.value as Role } })}
          className="rounded border border-line bg-white px-2 py-1"
        >
          {ROLES.map((r) => (
            <option key={r} value={r}>
              {ROLE_LABELS[r]}
            </option>
          ))}
        </select>
      ),
    },
    { key: 'status', header: 'Status', render: (p) => STATUS_TEXT[p.status], sortValue: (p) => p.status },
    {
      key: 'last',
      header: 'Last sign-in',
      render: (p) => dateTimeText(p.lastSignInAt),
      sortValue: (p) => p.lastSignInAt ?? '',
    },
    {
      key: 'actions',
      header: 'Actions',
      render: (p) =>
        p.id === me?.id ? (
          <span className="text-xs text-muted">You</span>
        ) : (
          <div className="flex flex-wrap gap-2">
            {p.status !== 'deactivated' && (
              <Button variant="secondary" className="px-2 py-1 text-xs" onClick={() => link.mutate(p.id)}>
                {p.status === 'invited' ? 'Resend invitation' : 'Send reset link'}
              </Button>
            )}
            {p.status === 'deactivated' ? (
              <Button
                variant="secondary"
                className="px-2 py-1 text-xs"
                onClick={() => update.mutate({ id: p.id, patch: { status: 'active' } })}
              >
                Reactivate
              </Button>
            ) : (
              <Button
                variant="danger"
                className="px-2 py-1 text-xs"
                onClick={() =>
                  window.confirm(`Deactivate ${p.name}? Their sessions end at once.`) &&
                  update.mutate({ id: p.id, patch: { status: 'deactivated' } })
                }
              >
                Deactivate
              </Button>
            )}
          </div>
        ),
    },
  ];

  return (
    <Page title="People" intro="Invite colleagues, set what each role may do, and switch off access at once when someone leaves.">
      <InviteForm />
      <div className="mt-6 space-y-3">
        {update.error && <ErrorMessage title="Not changed" error={update.error} />}
        {link.isSuccess && <Notice>Link sent. It is in the outbox.</Notice>}
        {people.isPending && <Spinner label="Loading people…" />}
        {people.error && <ErrorMessage error={people.error} />}
        {people.data &&
          (people.data.items.length ? (
            <>
              <DataTable caption="People" rows={people.data.items} columns={columns} initialSort={{ key: 'name', dir: 'asc' }} />
              <DownloadCsvButton name={['people']} header={PEOPLE_HEADER} rows={() => people.data.items.map(personRow)} />
            </>
          ) : (
            <EmptyState title="Nobody here yet" />
          ))}
      </div>
    </Page>
  );
}
