import type { AuditEntry as AuditView, Page } from '../../shared/schemas/workspace-views';
import type { Conn } from '../db/knex';
import type { AuditLogRow } from '../db/tables';

export type Actor = { id: number; email: string };

export type AuditEntry = {
  actor?: Actor | null;
  actorEmail?: string | null;
  action: string;
  targetType?: string;
  targetId?: string | number;
  detail?: Record<string, unknown>;
};

export type AuditQuery = { page: number; pageSize: number; action?: string; actor?: string; workstationId?: number };

export async function writeAudit(db: Conn, entry: AuditEntry): Promise<void> {
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

// Binds a service's target type, so each entry names only what happened to which record.
export function auditOf(targetType: string) {
  return (db: Conn, actor: Actor, action: string, targetId: number, detail?: Record<string, unknown>): Promise<void> =>
    writeAudit(db, { actor, action, targetType, targetId, detail });
}

const toView = (a: AuditLogRow): AuditView => ({
  id: a.id,
  actorEmail: a.actor_email,
  action: a.action,
  targetType: a.target_type,
  targetId: a.target_id,
  detail: a.detail ? JSON.parse(String(a.detail)) : null,
  createdAt: a.created_at,
});

export async function listAudit(db: Conn, q: AuditQuery): Promise<Page<AuditView>> {
  const base = db('audit_log').modify((b) => {
    if (q.action) b.where('action', q.action);
    if (q.actor) b.where('actor_email', q.actor.toLowerCase());
    // A workstation's trail includes what happened to its scenarios.
    if (q.workstationId) {
      const id = q.workstationId;
      b.where((w) =>
        w
          .where({ target_type: 'workstation', target_id: String(id) })
          .orWhere((s) =>
            s
              .where('target_type', 'scenario')
              .whereIn('target_id', db('scenarios').where('workstation_id', id).select(db.raw('cast(id as text)'))),
          ),
      );
    }
  });
  const [{ count }] = await base.clone().count<{ count: number }[]>({ count: '*' });
  const rows = await base
    .clone()
    .orderBy('id', 'desc')
    .limit(q.pageSize)
    .offset((q.page - 1) * q.pageSize);
  return { items: rows.map(toView), total: Number(count), page: q.page, pageSize: q.pageSize };
}
