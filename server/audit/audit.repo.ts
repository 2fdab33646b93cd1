import type { Knex } from 'knex';
import type { Db } from '../db/knex';

export type AuditEntry = {
  actor?: { id: number; email: string } | null;
  actorEmail?: string | null;
  action: string;
  targetType?: string;
  targetId?: string | number;
  detail?: Record<string, unknown>;
};

export async function writeAudit(db: Db | Knex.Transaction, entry: AuditEntry): Promise<void> {
  await db('audit_log').insert({
    actor_id: entry.actor?.id ?? null,
    actor_email: entry.actor?.email ?? entry.actorEmail ?? null,
    action: entry.action,
    target_type: entry.targetType ?? null,
    target_id: entry.targetId == null ? null : String(entry.targetId),
    detail: entry.detail ? JSON.stringify(entry.detail) : null,
    created_at: new Date().toISOString(),
  });
}
