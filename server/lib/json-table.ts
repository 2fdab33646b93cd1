import type { Knex } from 'knex';
import type { Db } from '../db/knex';

type Conn = Db | Knex.Transaction;
export type JsonRow<T> = { id: number; name: string; data: T; createdAt: string; updatedAt: string } & Record<string, unknown>;

// Rooms, workstations and dust agents keep their fields as one validated JSON column.
export function jsonTable<T>(table: string, parents: Record<string, string> = {}) {
  const map = (r: Record<string, unknown>): JsonRow<T> => {
    const out: JsonRow<T> = { id: r.id as number, name: r.name as string, data: JSON.parse(r.data as string) as T, createdAt: r.created_at as string, updatedAt: r.updated_at as string };
    for (const [key, column] of Object.entries(parents)) out[key] = r[column];
    return out;
  };
  return {
    async list(db: Conn, where: Record<string, unknown> = {}) {
      const rows = await db(table).where(where).whereNull('deleted_at').orderBy('name');
      return rows.map(map);
    },
    async get(db: Conn, id: number) {
      const row = await db(table).where({ id }).whereNull('deleted_at').first();
      return row ? map(row) : undefined;
    },
    async insert(db: Conn, values: { name: string; data: T; createdBy: number } & Record<string, unknown>) {
      const now = new Date().toISOString();
      const { name, data, createdBy, ...rest } = values;
      const cols: Record<string, unknown> = { name, data: JSON.stringify(data), created_by: createdBy, created_at: now, updated_at: now };
      for (const [key, column] of Object.entries(parents)) if (key in rest) cols[column] = rest[key];
      const [row] = await db(table).insert(cols).returning('id');
      return (typeof row === 'object' ? row.id : row) as number;
    },
    async update(db: Conn, id: number, patch: { name?: string; data?: T }) {
      const cols: Record<string, unknown> = { updated_at: new Date().toISOString() };
      if (patch.name !== undefined) cols.name = patch.name;
      if (patch.data !== undefined) cols.data = JSON.stringify(patch.data);
      await db(table).where({ id }).update(cols);
    },
    async softDelete(db: Conn, id: number) {
      await db(table).where({ id }).update({ deleted_at: new Date().toISOString() });
    },
  };
}
