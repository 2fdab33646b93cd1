import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import request from 'supertest';
import Database from 'better-sqlite3';
import { describe, expect, it } from 'vitest';
import { createApp } from '../../server/app';
import { createDb, migrateLatest } from '../../server/db/knex';
import { seedDemo } from '../../server/db/seed';
import { createOutboxMailer } from '../../server/mail/mailer';
import { startServer } from '../helpers/server';
import { createTestApp, HOST, ORIGIN } from '../helpers/test-app';

async function signInCookie(url: string): Promise<string> {
  const res = await fetch(`${url}/api/auth/login`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json', Origin: url },
    body: JSON.stringify({ email: 'engineer@motewalk.local', password: 'demo-engineer-pass' }),
  });
  expect(res.status).toBe(200);
  return res.headers.get('set-cookie')!.split(';')[0];
}

describe('a server killed in the middle of a stream of writes', () => {
  it('keeps every write it acknowledged, half-writes none, and passes the integrity check', async () => {
    const first = await startServer({ DEMO_PARTICLES: '300' });
    const cookie = await signInCookie(first.url);
    const acknowledged: { id: number; name: string }[] = [];
    let stop = false;
    const writer = async (lane: number) => {
      for (let i = 0; !stop; i += 1) {
        const name = `Kill test ${lane}-${i}`;
        try {
          const res = await fetch(`${first.url}/api/sites`, {
            method: 'POST',
            headers: { 'Content-Type': 'application/json', Origin: first.url, Cookie: cookie },
            body: JSON.stringify({ name, data: { address: `${'x'.repeat(200)} ${i}` } }),
          });
          if (res.status === 201) acknowledged.push({ id: (await res.json()).id, name });
        } catch {
          return;
        }
      }
    };
    const lanes = [0, 1, 2, 3].map(writer);
    while (acknowledged.length < 40) await new Promise((r) => setTimeout(r, 10));
    const exited = new Promise((r) => first.proc.once('exit', r));
    first.proc.kill('SIGKILL');
    stop = true;
    await Promise.all(lanes);
    await exited;

    const second = await startServer({ DEMO_PARTICLES: '300' }, first.dbFile);
    try {
      const db = new Database(first.dbFile, { readonly: true });
      expect(db.pragma('integrity_check', { simple: true })).toBe('ok');
      for (const a of acknowledged) expect(db.prepare('select name from sites where id = ?').get(a.id)).toEqual({ name: a.name });
      // Each site and its audit row are written in one transaction: never one without the other.
      const sites = db.prepare("select id, data from sites where name like 'Kill test %'").all() as { id: number; data: string }[];
      const audited = new Set(
        (db.prepare("select target_id from audit_log where action = 'site.created'").all() as { target_id: string }[]).map((r) =>
          Number(r.target_id),
        ),
      );
      for (const s of sites) {
        expect(() => JSON.parse(s.data)).not.toThrow();
        expect(audited.has(s.id)).toBe(true);
      }
      expect(sites.length).toBeGreaterThanOrEqual(acknowledged.length);
      db.close();
      expect((await fetch(`${second.url}/api/health`)).status).toBe(200);
    } finally {
      await second.stop();
    }
  }, 120_000);
});

describe('storage that cannot be written', () => {
  it('answers 503 with the one error shape when the database file is read-only, and keeps serving', async () => {
    const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'motewalk-ro-'));
    const file = path.join(dir, 'ro.sqlite');
    const rw = createDb(file);
    await migrateLatest(rw);
    await seedDemo(rw, { workspace: false });
    await rw.raw('PRAGMA wal_checkpoint(TRUNCATE)');
    await rw.destroy();
    const db = createDb(file, { readonly: true });
    const app = createApp({ db, mailer: createOutboxMailer(db, 'x@y.z'), sessionSecret: 'read-only-test-secret', publicUrl: ORIGIN });
    const res = await request(app)
      .post('/api/auth/login')
      .set('Host', HOST)
      .set('Origin', ORIGIN)
      .send({ email: 'admin@motewalk.local', password: 'demo-admin-pass' });
    expect(res.status).toBe(503);
    expect(res.body).toEqual({ code: 'storage_unavailable', message: 'Storage is unavailable (full or read-only); nothing was saved' });
    expect((await request(app).get('/api/health')).status).toBe(200);
    await db.destroy();
  });

  it('answers 503 when the disk is full, never a 500', async () => {
    const t = await createTestApp();
    const engineer = await t.signIn('engineer');
    const { page_count } = (await t.db.raw('PRAGMA page_count'))[0];
    await t.db.raw(`PRAGMA max_page_count = ${page_count + 2}`);
    const statuses = new Set<number>();
    for (let i = 0; i < 200 && !statuses.has(503); i += 1) {
      statuses.add(
        (await engineer.post('/api/sites').send({ name: `Full ${i}`, data: { address: 'y'.repeat(300), notes: 'z'.repeat(900) } })).status,
      );
    }
    expect(statuses.has(503)).toBe(true);
    expect(statuses.has(500)).toBe(false);
    await t.close();
  });
});

describe('an error inside one request', () => {
  it('answers 500 with the one error shape and the next request is served', async () => {
    const t = await createTestApp();
    const admin = await t.signIn('admin');
    await t.db.schema.dropTable('outbox');
    const broken = await admin.get('/api/outbox');
    expect(broken.status).toBe(500);
    expect(broken.body).toEqual({ code: 'internal', message: 'Something went wrong on the server' });
    expect((await admin.get('/api/people')).status).toBe(200);
    await t.close();
  });

  it('reports a failed invitation e-mail clearly instead of pretending it went', async () => {
    const t = await createTestApp();
    const app = createApp({
      db: t.db,
      mailer: { send: async () => Promise.reject(new Error('SMTP down')) },
      sessionSecret: 'mail-failure-secret-1',
      publicUrl: ORIGIN,
    });
    const agent = request.agent(app).set('Host', HOST).set('Origin', ORIGIN);
    await agent.post('/api/auth/login').send({ email: 'admin@motewalk.local', password: 'demo-admin-pass' });
    const res = await agent.post('/api/people').send({ email: 'new@motewalk.local', name: 'New', role: 'viewer' });
    expect(res.status).toBe(502);
    expect(res.body.code).toBe('mail_failed');
    expect(res.body.message).toMatch(/Resend invitation/);
    await t.close();
  });
});
