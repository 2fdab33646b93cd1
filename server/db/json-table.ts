import type { JsonRecord } from '../../shared/schemas/workspace-views';
import type { Conn } from './knex';
import type { DustAgentRow, RoomRow, SiteRow, WorkstationRow } from './tables';

type JsonTableName = 'sites' | 'rooms' | 'workstations' | 'dust_agents';
type AnyJsonRow = SiteRow | RoomRow | WorkstationRow | DustAgentRow;
export type JsonRow<T, K extends string = never> = JsonRecord<T> & Record<K, number>;

// Rooms, workstations and dust agents keep their fields as one validated JSON column.
export function jsonTable<T, K extends string = never>(table: JsonTableName, parents: Record<K, string> = {} as Record<K, string>) {
  const map = (r: AnyJsonRow): JsonRow<T, K> => {
    const out = {
      id: r.id,
      name: r.name,
      data: JSON.parse(r.data) as T,
      version: r.version,
      createdAt: r.created_at,
      updatedAt: r.updated_at,
    } as JsonRow<T, K>;
    for (const [key, column] of Object.entries(parents) as [K, string][])
      (out as Record<K, number>)[key] = (r as unknown as Record<string, number>)[column];
    return out;
  };
  return {
    async list(db: Conn, where: Record<string, unknown> = {}): Promise<JsonRow<T, K>[]> {
      const rows: AnyJsonRow[] = await db(table).where(where).whereNull('deleted_at').orderBy('name');
      return rows.map(map);
    },
    async get(db: Conn, id: number): Promise<JsonRow<T, K> | undefined> {
      const row: AnyJsonRow | undefined = await db(table).where({ id }).whereNull('deleted_at').first();
      return row ? map(row) : undefined;
    },
    async insert(db: Conn, values: { name: string; data: T; createdBy: number } & Partial<Record<K, number>>): Promise<number> {
      const now = new Date().toISOString();
      const { name, data, createdBy, ...rest } = values;
      const cols: Record<string, unknown> = { name, data: JSON.stringify(data), created_by: createdBy, created_at: now, updated_at: now };
      for (const [key, column] of Object.entries(parents) as [K, string][])
        if (key in rest) cols[column] = (rest as unknown as Record<K, number>)[key];
      const [row] = await db(table)
        .insert(cols as never)
        .returning('id');
      return (typeof row === 'object' ? row.id : row) as number;
    },
    // Only the version named is overwritten, and the row moves on to the next one.
    async update(db: Conn, id: number, version: number, patch: { name?: string; data?: T }): Promise<boolean> {
      const cols: Record<string, unknown> = { updated_at: new Date().toISOString(), version: version + 1 };
      if (patch.name !== undefined) cols.name = patch.name;
      if (patch.data !== undefined) cols.data = JSON.stringify(patch.data);
      return (await db(table).where({ id, version }).whereNull('deleted_at').update(cols)) === 1;
    },
    async softDelete(db: Conn, id: number): Promise<void> {
      await db(table).where({ id }).update({ deleted_at: new Date().toISOString() });
    },
  };
}
