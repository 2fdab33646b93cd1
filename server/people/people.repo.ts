import type { Person } from '../../shared/schemas/auth';
import type { Page } from '../../shared/schemas/workspace-views';
import type { Role } from '../../shared/auth/permissions';
import type { Conn, Db } from '../db/knex';
import type { PersonRow } from '../db/tables';

type Row = PersonRow & { role: Role; status: Person['status'] };

const toPerson = (r: Row): Person => ({
  id: r.id,
  email: r.email,
  name: r.name,
  role: r.role,
  status: r.status,
  createdAt: r.created_at,
  lastSignInAt: r.last_sign_in_at,
});

const SORTABLE: Record<string, string> = { name: 'name', email: 'email', role: 'role', status: 'status', createdAt: 'created_at' };

export async function findPerson(db: Conn, id: number): Promise<Person | undefined> {
  const row = await db<Row>('people').where({ id }).first();
  return row ? toPerson(row) : undefined;
}

// The only read that returns the hash; it never leaves the auth service.
export async function findCredentials(db: Db, email: string) {
  const row = await db<Row>('people').where({ email }).first();
  return row ? { person: toPerson(row), passwordHash: row.password_hash } : undefined;
}

export type PeopleQuery = { page: number; pageSize: number; sort?: string; order: 'asc' | 'desc' };

export async function listPeople(db: Db, q: PeopleQuery): Promise<Page<Person>> {
  const column = SORTABLE[q.sort ?? 'name'] ?? 'name';
  const [{ count }] = await db('people').count<{ count: number }[]>({ count: '*' });
  const rows = await db<Row>('people')
    .orderBy(column, q.order)
    .orderBy('id')
    .limit(q.pageSize)
    .offset((q.page - 1) * q.pageSize);
  return { items: rows.map(toPerson), total: Number(count), page: q.page, pageSize: q.pageSize };
}

export async function insertPerson(
  db: Conn,
  p: { email: string; name: string; role: Role; status: Person['status']; passwordHash?: string | null },
): Promise<number> {
  const now = new Date().toISOString();
  const [row] = await db('people')
    .insert({
      email: p.email,
      name: p.name,
      role: p.role,
      status: p.status,
      password_hash: p.passwordHash ?? null,
      created_at: now,
      updated_at: now,
    })
    .returning('id');
  return typeof row === 'object' ? row.id : row;
}

export async function updatePerson(
  db: Conn,
  id: number,
  patch: Partial<{ role: Role; status: Person['status']; passwordHash: string; lastSignInAt: string }>,
): Promise<void> {
  const cols: Record<string, unknown> = { updated_at: new Date().toISOString() };
  if (patch.role) cols.role = patch.role;
  if (patch.status) cols.status = patch.status;
  if (patch.passwordHash) cols.password_hash = patch.passwordHash;
  if (patch.lastSignInAt) cols.last_sign_in_at = patch.lastSignInAt;
  await db('people').where({ id }).update(cols);
}

export async function rolesOf(db: Conn, ids: number[]): Promise<{ id: number; role: Role }[]> {
  return (await db('people').whereIn('id', ids).select('id', 'role')) as { id: number; role: Role }[];
}

export async function findByEmail(db: Conn, email: string): Promise<Person | undefined> {
  const row = await db<Row>('people').where({ email }).first();
  return row ? toPerson(row) : undefined;
}

export async function firstWithRole(db: Conn, role: Role): Promise<Person | undefined> {
  const row = await db<Row>('people').where({ role }).first();
  return row ? toPerson(row) : undefined;
}

export async function countPeople(db: Db): Promise<number> {
  const [{ count }] = await db('people').count<{ count: number }[]>({ count: '*' });
  return Number(count);
}
