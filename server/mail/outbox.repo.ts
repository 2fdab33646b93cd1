import type { OutboxMessage, Page } from '../../shared/schemas/workspace-views';
import type { Conn } from '../db/knex';
import type { OutboxRow } from '../db/tables';
import type { Mail } from './mailer';

const toMessage = (m: OutboxRow): OutboxMessage => ({
  id: m.id,
  to: m.to_address,
  subject: m.subject,
  text: m.text_body,
  html: m.html_body,
  createdAt: m.created_at,
});

export async function insertOutboxMail(db: Conn, mail: Mail): Promise<void> {
  await db('outbox').insert({
    to_address: mail.to,
    subject: mail.subject,
    text_body: mail.text,
    html_body: mail.html ?? null,
    created_at: new Date().toISOString(),
  });
}

export async function listOutbox(db: Conn, q: { page: number; pageSize: number }): Promise<Page<OutboxMessage>> {
  const [{ count }] = await db('outbox').count<{ count: number }[]>({ count: '*' });
  const rows = await db('outbox')
    .orderBy('id', 'desc')
    .limit(q.pageSize)
    .offset((q.page - 1) * q.pageSize);
  return { items: rows.map(toMessage), total: Number(count), page: q.page, pageSize: q.pageSize };
}
