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

export type AuditRecord = Omit<AuditView, 'actorName' | 'actorEmail' | 'targetName'> & {
  actorId: number | null;
  actorEmail: string | null;
};

const toRecord = (a: AuditLogRow): AuditRecord => ({
  id: a.id,
  actorId: a.actor_id,
  actorEmail: a.actor_email,
  action: a.action,
  targetType: a.target_type,
  targetId: a.target_id,
  detail: a.detail ? JSON.parse(String(a.detail)) : null,
  createdAt: a.created_at,
});

// Every kind of record the trail names, and its table; deleted records keep their names.
const NAMED_TABLES = {
  person: 'people',
  site: 'sites',
  room: 'rooms',
  workstation: 'workstations',
  agent: 'dust_agents',
  size_profile: 'size_profiles',
  scenario: 'scenarios',
} as const;

export type NameBook = {
  people: { id: number; name: string; email: string }[];
  targets: Map<string, string>;
};

/** Names of the people and records a page of entries mentions, keyed "type:id" for records. */
export async function namesFor(db: Conn, records: AuditRecord[]): Promise<NameBook> {
  const people = await db('people').select('id', 'name', 'email');
  const targets = new Map<string, string>();
  for (const [type, table] of Object.entries(NAMED_TABLES)) {
    const ids = [...new Set(records.filter((r) => r.targetType === type && r.targetId).map((r) => Number(r.targetId)))];
    if (ids.length === 0) continue;
    const rows: { id: number; name: string }[] = await db(table).whereIn('id', ids).select('id', 'name');
    for (const row of rows) targets.set(`${type}:${row.id}`, row.name);
  }
  return { people, targets };
}

export async function listAudit(db: Conn, q: AuditQuery & { emails: boolean }): Promise<Page<AuditRecord>> {
  const base = db('audit_log').modify((b) => {
    if (q.action) b.where('action', q.action);
    // Anyone finds a person by name; only readers who see addresses may look one up by address.
    if (q.actor) {
      const text = q.actor.trim().toLowerCase();
      b.where((w) => {
        w.whereIn('actor_id', db('people').whereRaw('instr(lower(name), ?) > 0', [text]).select('id'));
        if (q.emails) w.orWhere('actor_email', text);
      });
    }
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
  return { items: rows.map(toRecord), total: Number(count), page: q.page, pageSize: q.pageSize };
}
