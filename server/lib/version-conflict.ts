import type { Conn } from '../db/knex';
import { AppError, notFound } from './app-error';

// Optimistic concurrency: the caller names the version it edited, so a save made meanwhile is never silently
// undone. The 409 carries the record as it now stands, for the person to reapply their change to it.
export function assertEditedVersion(what: string, edited: number, current: { version: number }, shown: unknown = current): void {
  if (edited === current.version) return;
  throw new AppError(
    409,
    'version_conflict',
    `Someone saved this ${what} after you opened it (your version ${edited}, current ${current.version}). Review both before saving again.`,
    undefined,
    { current: shown },
  );
}

export type VersionedTable<R, P> = {
  get: (db: Conn, id: number) => Promise<R | undefined>;
  update: (db: Conn, id: number, version: number, patch: P) => Promise<boolean>;
};

// One edit of a versioned record inside the caller's transaction: missing → 404, stale → 409, else saved.
export async function editAtVersion<R extends { version: number }, P>(
  trx: Conn,
  table: VersionedTable<R, P>,
  what: string,
  id: number,
  edited: number,
  patch: P,
): Promise<{ before: R; after: R }> {
  const missing = () => notFound(what.charAt(0).toUpperCase() + what.slice(1));
  const before = await table.get(trx, id);
  if (!before) throw missing();
  assertEditedVersion(what, edited, before);
  // The update names the version too, so a write that slipped in between is still caught.
  if (!(await table.update(trx, id, edited, patch))) assertEditedVersion(what, edited, (await table.get(trx, id)) ?? { version: 0 });
  const after = await table.get(trx, id);
  if (!after) throw missing();
  return { before, after };
}
