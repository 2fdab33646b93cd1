import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import Database from 'better-sqlite3';
import { describe, expect, it } from 'vitest';
import { createDb, migrateLatest } from '../../server/db/knex';
import { seedDemo } from '../../server/db/seed';
import { backupDatabase, defaultBackupPath } from '../../server/db/backup';

describe('online backup', () => {
  it('copies a consistent database while writes go on, and the copy opens and matches', async () => {
    const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'motewalk-backup-'));
    const file = path.join(dir, 'live.sqlite');
    const db = createDb(file);
    await migrateLatest(db);
    await seedDemo(db, { workspace: false });
    const writes = (async () => {
      for (let i = 0; i < 50; i += 1)
        await db('outbox').insert({ to_address: `a${i}@b.org`, subject: 's', text_body: 't', created_at: new Date().toISOString() });
    })();
    const target = defaultBackupPath(file);
    const { pages } = await backupDatabase(file, target);
    await writes;
    expect(pages).toBeGreaterThan(0);
    const copy = new Database(target, { readonly: true });
    expect(copy.pragma('integrity_check', { simple: true })).toBe('ok');
    expect((copy.prepare('select count(*) as n from people').get() as { n: number }).n).toBe(4);
    // A consistent snapshot holds a prefix of the sequential writes: ids 1..n with no gap, every row whole.
    const rows = copy.prepare('select id, to_address from outbox order by id').all() as { id: number; to_address: string }[];
    expect(rows.length).toBeLessThanOrEqual(50);
    rows.forEach((r, i) => expect(r).toEqual({ id: i + 1, to_address: `a${i}@b.org` }));
    copy.close();
    await db.destroy();
    expect(path.basename(target)).toMatch(/^motewalk-\d{8}-\d{6}\.sqlite$/);
  });
});
