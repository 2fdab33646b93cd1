import { dateTimeText } from '../../../../shared/format/index';
import { Page } from '@/components/ui/page';
import { EmptyState, ErrorMessage, Spinner } from '@/components/ui/status';
import { useOutbox } from '@/features/outbox/api/get-outbox';

const linkify = (text: string) =>
  text.split(/(https?:\/\/\S+)/g).map((part, i) =>
    /^https?:\/\//.test(part) ? (
      <a key={i} href={part} className="break-all font-semibold text-accent underline">
        {part}
      </a>
    ) : (
      part
    ),
  );

export function OutboxPage() {
  const outbox = useOutbox();
  return (
    <Page title="Outbox" intro="Without an SMTP server configured, every e-mail Motewalk sends is kept here instead of being delivered.">
      {outbox.isPending && <Spinner label="Loading messages…" />}
      {outbox.error && <ErrorMessage error={outbox.error} />}
      {outbox.data && outbox.data.items.length === 0 && (
        <EmptyState title="No messages yet">Invitations, reset links and shared reports appear here.</EmptyState>
      )}
      <ul className="space-y-4">
        {outbox.data?.items.map((m) => (
          <li key={m.id} className="rounded-lg border border-line bg-white p-4">
            <div className="flex flex-wrap justify-between gap-2 text-sm">
              <span>
                To <strong>{m.to}</strong>
              </span>
              <time className="text-muted" dateTime={m.createdAt}>
                {dateTimeText(m.createdAt)}
              </time>
            </div>
            <h2 className="mt-1">{m.subject}</h2>
            <p className="mt-2 whitespace-pre-wrap text-sm">{linkify(m.text)}</p>
          </li>
        ))}
      </ul>
    </Page>
  );
}
