import type { AuditEntry, Page } from '../../shared/schemas/workspace-views';
import type { Conn } from '../db/knex';
import { listAudit, namesFor, type AuditQuery, type AuditRecord, type NameBook } from './audit.repo';

const EMAIL = /^[^\s@]+@[^\s@]+$/;

// Viewers and engineers see who did what by name; addresses are for those who manage people.
function privateDetail(detail: AuditRecord['detail'], book: NameBook, emails: boolean): AuditRecord['detail'] {
  if (!detail) return detail;
  const byEmail = new Map(book.people.map((p) => [p.email.toLowerCase(), p.name]));
  const byId = new Map(book.people.map((p) => [p.id, p.name]));
  const out: Record<string, unknown> = {};
  for (const [key, value] of Object.entries(detail)) {
    if (typeof value === 'string' && EMAIL.test(value)) {
      const name = byEmail.get(value.toLowerCase());
      out[`${key}Name`] = name ?? null;
      if (emails) out[key] = value;
    } else out[key] = value;
  }
  if (Array.isArray(detail.personIds)) out.personNames = detail.personIds.map((id) => byId.get(Number(id)) ?? null);
  return out;
}

export function toReaderView(r: AuditRecord, book: NameBook, emails: boolean): AuditEntry {
  const actor =
    (r.actorId !== null ? book.people.find((p) => p.id === r.actorId) : undefined) ??
    (r.actorEmail ? book.people.find((p) => p.email.toLowerCase() === r.actorEmail!.toLowerCase()) : undefined);
  return {
    id: r.id,
    actorName: actor?.name ?? null,
    actorEmail: emails ? r.actorEmail : null,
    action: r.action,
    targetType: r.targetType,
    targetId: r.targetId,
    targetName: r.targetType && r.targetId ? (book.targets.get(`${r.targetType}:${r.targetId}`) ?? null) : null,
    detail: privateDetail(r.detail, book, emails),
    createdAt: r.createdAt,
  };
}

export async function readAudit(db: Conn, q: AuditQuery, emails: boolean): Promise<Page<AuditEntry>> {
  const page = await listAudit(db, { ...q, emails });
  const book = await namesFor(db, page.items);
  return { ...page, items: page.items.map((r) => toReaderView(r, book, emails)) };
}
