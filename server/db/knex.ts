import fs from 'node:fs';
import path from 'node:path';
import knexFactory, { type Knex } from 'knex';
import { migrationSource } from './migration-source';
import type {} from './tables';

export type Db = Knex;
// Repo functions take either the database or a transaction, so a service can group writes.
export type Conn = Db | Knex.Transaction;

export const withTransaction = <T>(db: Db, work: (trx: Knex.Transaction) => Promise<T>): Promise<T> => db.transaction(work);

export function createDb(filename: string, opts: { readonly?: boolean } = {}): Db {
  if (filename !== ':memory:') fs.mkdirSync(path.dirname(path.resolve(filename)), { recursive: true });
  const memory = filename === ':memory:';
  return knexFactory({
    client: 'better-sqlite3',
    connection: { filename, options: { readonly: opts.readonly === true } },
    useNullAsDefault: true,
    // An in-memory database lives in one connection: never reap it.
    pool: memory
      ? { min: 1, max: 1, idleTimeoutMillis: 2_147_483_647, reapIntervalMillis: 2_147_483_647, afterCreate: configure }
      : { min: 1, max: 1, afterCreate: configure },
  });
}

function configure(conn: { pragma: (s: string) => unknown; readonly: boolean }, done: (err: Error | null, conn: unknown) => void) {
  try {
    if (!conn.readonly) conn.pragma('journal_mode = WAL');
    conn.pragma('foreign_keys = ON');
    conn.pragma('busy_timeout = 5000');
    conn.pragma('synchronous = NORMAL');
    done(null, conn);
  } catch (err) {
    done(err as Error, conn);
  }
}

export async function migrateLatest(db: Db): Promise<void> {
  await db.migrate.latest({ migrationSource });
}
