import { spawnSync } from 'node:child_process';
import Database from 'better-sqlite3';
import { describe, expect, it } from 'vitest';
import { startServer } from '../helpers/server';

describe('starting the server', () => {
  it('exits non-zero with a message when its port is busy, while the first server keeps serving', async () => {
    const first = await startServer({ DEMO_PARTICLES: '300' });
    try {
      const port = new URL(first.url).port;
      const second = startServer({ PORT: port, DEMO_PARTICLES: '300' });
      await expect(second).rejects.toThrow(/server exited with 1:[\s\S]*port \d+ is already in use/);
      await expect(second).rejects.not.toThrow(/is running on/);
      expect((await fetch(`${first.url}/api/health`)).status).toBe(200);
    } finally {
      await first.stop();
    }

    // A restart on the same database prunes the sessions that expired while it was down.
    const db = new Database(first.dbFile);
    db.prepare('insert into sessions (sid, sess, expired) values (?, ?, ?)').run('stale', '{"cookie":{}}', '2020-01-01T00:00:00.000Z');
    db.close();
    const third = await startServer({ DEMO_PARTICLES: '300' }, first.dbFile);
    try {
      const check = new Database(first.dbFile, { readonly: true });
      await expect.poll(() => check.prepare("select count(*) as n from sessions where sid = 'stale'").get()).toEqual({ n: 0 });
      check.close();
    } finally {
      await third.stop();
    }
  }, 180_000);

  it('refuses to start in production without PUBLIC_URL, saying which variable is missing', () => {
    const run = spawnSync(process.execPath, ['--import', 'tsx', 'server/index.ts'], {
      env: { ...process.env, NODE_ENV: 'production', PUBLIC_URL: '', DATABASE_FILE: ':memory:', PORT: '0' },
      encoding: 'utf8',
      timeout: 60_000,
    });
    expect(run.status).toBe(1);
    expect(run.stderr).toMatch(/Motewalk could not start: Invalid environment:\n {2}PUBLIC_URL: is required when NODE_ENV=production/);
    expect(run.stderr).not.toMatch(/\n\s+at /);
  }, 60_000);
});
