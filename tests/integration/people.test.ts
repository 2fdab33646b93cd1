import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../helpers/test-app';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

const NON_ADMINS = ['engineer', 'viewer', 'operator'] as const;

describe('admin endpoints refuse everyone but admins', () => {
  const calls = [
    ['get', '/api/people', undefined],
    ['post', '/api/people', { email: 'x@motewalk.local', name: 'X', role: 'viewer' }],
    ['patch', '/api/people/2', { role: 'viewer' }],
    ['post', '/api/people/2/password-link', {}],
    ['get', '/api/outbox', undefined],
  ] as const;

  it.each(calls)('answers 401 to anonymous %s %s', async (method, url, body) => {
    const res = await t.anonymous()[method](url).send(body);
    expect(res.status).toBe(401);
    expect(res.body.code).toBe('unauthenticated');
  });

  for (const role of NON_ADMINS) {
    it.each(calls)(`answers 403 to a ${role} on %s %s`, async (method, url, body) => {
      const agent = await t.signIn(role);
      const res = await agent[method](url).send(body);
      expect(res.status).toBe(403);
      expect(res.body).toEqual({ code: 'forbidden', message: 'You do not have permission to do this' });
    });
  }
});

describe('GET /api/people', () => {
  it('lists people sorted by the asked column with no password hashes', async () => {
    const admin = await t.signIn('admin');
    const res = await admin.get('/api/people?sort=email&order=desc&pageSize=2');
    expect(res.status).toBe(200);
    expect(res.body.total).toBe(4);
    expect(res.body.items.map((p: { email: string }) => p.email)).toEqual(['viewer@motewalk.local', 'operator@motewalk.local']);
    expect(JSON.stringify(res.body)).not.toMatch(/scrypt|hash/i);
  });

  it('answers 400 for a page size out of range', async () => {
    const admin = await t.signIn('admin');
    const res = await admin.get('/api/people?pageSize=5000');
    expect(res.status).toBe(400);
    expect(res.body.issues[0].path).toBe('query.pageSize');
  });
});

describe('inviting a person', () => {
  it('answers 400 with every field path when the invitation is malformed', async () => {
    const admin = await t.signIn('admin');
    const res = await admin.post('/api/people').send({ email: 'nope', name: '', role: 'king' });
    expect(res.status).toBe(400);
    expect(res.body.issues.map((i: { path: string }) => i.path).sort()).toEqual(['body.email', 'body.name', 'body.role']);
    expect(await t.db('people').count({ n: '*' })).toEqual([{ n: 4 }]);
  });

  it('creates an invited account, mails a one-time link, and lets the person set a password and sign in', async () => {
    const admin = await t.signIn('admin');
    const res = await admin.post('/api/people').send({ email: 'New.Hygienist@Motewalk.local', name: 'Ada Brenner', role: 'engineer' });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ email: 'new.hygienist@motewalk.local', status: 'invited', role: 'engineer' });
    const row = await t.db('people').where({ email: 'new.hygienist@motewalk.local' }).first();
    expect(row.password_hash).toBeNull();
    const mail = await t.db('outbox').where({ to_address: 'new.hygienist@motewalk.local' }).first();
    const token = /token=([\w-]+)/.exec(mail.text_body)![1];
    const tokenRow = await t.db('password_tokens').where({ person_id: row.id }).first();
    expect(tokenRow.token_hash).not.toBe(token);
    const hours = (Date.parse(tokenRow.expires_at) - Date.parse(tokenRow.created_at)) / 3.6e6;
    expect(hours).toBe(72);

    const set = await t.anonymous().post('/api/auth/set-password').send({ token, password: 'a-good-long-password' });
    expect(set.status).toBe(200);
    const again = await t.anonymous().post('/api/auth/set-password').send({ token, password: 'another-long-password' });
    expect(again.status).toBe(400);
    expect(again.body.code).toBe('invalid_token');
    const login = await t
      .anonymous()
      .post('/api/auth/login')
      .send({ email: 'new.hygienist@motewalk.local', password: 'a-good-long-password' });
    expect(login.status).toBe(200);
    expect(await t.db('audit_log').where({ action: 'person.invited' }).count({ n: '*' })).toEqual([{ n: 1 }]);
  });

  it('answers 409 when the e-mail already has an account', async () => {
    const admin = await t.signIn('admin');
    const res = await admin.post('/api/people').send({ email: 'viewer@motewalk.local', name: 'Dup', role: 'viewer' });
    expect(res.status).toBe(409);
  });
});

describe('changing a person', () => {
  it('changes a role and writes the audit log', async () => {
    const admin = await t.signIn('admin');
    const id = await t.personId('viewer');
    const res = await admin.patch(`/api/people/${id}`).send({ role: 'engineer' });
    expect(res.status).toBe(200);
    expect((await t.db('people').where({ id }).first()).role).toBe('engineer');
    expect(
      await t
        .db('audit_log')
        .where({ action: 'person.role_changed', target_id: String(id) })
        .first(),
    ).toBeTruthy();
    await admin.patch(`/api/people/${id}`).send({ role: 'viewer' });
  });

  it('stops a deactivated person at once, even inside a live session', async () => {
    const admin = await t.signIn('admin');
    const engineer = await t.signIn('engineer');
    expect((await engineer.get('/api/auth/me')).status).toBe(200);
    const id = await t.personId('engineer');
    expect((await admin.patch(`/api/people/${id}`).send({ status: 'deactivated' })).status).toBe(200);
    expect((await engineer.get('/api/auth/me')).status).toBe(401);
    const login = await t.anonymous().post('/api/auth/login').send({ email: 'engineer@motewalk.local', password: 'demo-engineer-pass' });
    expect(login.status).toBe(401);
    await admin.patch(`/api/people/${id}`).send({ status: 'active' });
  });

  it('refuses unknown fields and an admin removing their own access', async () => {
    const admin = await t.signIn('admin');
    const self = await t.personId('admin');
    expect((await admin.patch(`/api/people/${self}`).send({ status: 'deactivated' })).status).toBe(400);
    const res = await admin.patch(`/api/people/${self}`).send({ isAdmin: true });
    expect(res.status).toBe(400);
    expect((await admin.patch('/api/people/99999').send({ role: 'viewer' })).status).toBe(404);
  });

  it('sends a reset link that goes to the outbox', async () => {
    const admin = await t.signIn('admin');
    const id = await t.personId('viewer');
    const res = await admin.post(`/api/people/${id}/password-link`).send({});
    expect(res.status).toBe(202);
    const mail = await t.db('outbox').where({ to_address: 'viewer@motewalk.local' }).orderBy('id', 'desc').first();
    expect(mail.subject).toBe('Reset your Motewalk password');
    const outbox = await admin.get('/api/outbox');
    expect(outbox.status).toBe(200);
    expect(outbox.body.items[0].to).toBe('viewer@motewalk.local');
  });
});
