import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, HOST, type TestApp } from '../helpers/test-app';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

describe('POST /api/auth/login', () => {
  it('signs in a demo engineer, sets a hardened cookie and returns no password hash', async () => {
    const res = await t.anonymous().post('/api/auth/login').send({ email: 'Engineer@Motewalk.local', password: 'demo-engineer-pass' });
    expect(res.status).toBe(200);
    expect(res.body.user).toMatchObject({ email: 'engineer@motewalk.local', role: 'engineer' });
    expect(JSON.stringify(res.body)).not.toMatch(/scrypt|password_hash|passwordHash/);
    const cookie = String(res.headers['set-cookie']);
    expect(cookie).toMatch(/motewalk\.sid=/);
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=Lax/i);
    const row = await t.db('audit_log').where({ action: 'auth.signed_in' }).orderBy('id', 'desc').first();
    expect(row.actor_email).toBe('engineer@motewalk.local');
  });

  it('gives the same message for an unknown account and a wrong password', async () => {
    const unknown = await t.anonymous().post('/api/auth/login').send({ email: 'nobody@motewalk.local', password: 'whatever-123' });
    const wrong = await t.anonymous().post('/api/auth/login').send({ email: 'viewer@motewalk.local', password: 'not-the-password' });
    expect(unknown.status).toBe(401);
    expect(wrong.status).toBe(401);
    expect(unknown.body).toEqual(wrong.body);
    expect(await t.db('audit_log').where({ action: 'auth.sign_in_failed' }).count({ n: '*' })).toEqual([{ n: 2 }]);
  });

  it('answers 400 with field paths when the body is not a sign-in', async () => {
    const res = await t.anonymous().post('/api/auth/login').send({ email: 'not-an-email', password: '' });
    expect(res.status).toBe(400);
    expect(res.body.code).toBe('invalid_input');
    expect(res.body.issues.map((i: { path: string }) => i.path).sort()).toEqual(['body.email', 'body.password']);
  });

  it('refuses a sign-in posted from another site', async () => {
    const res = await request(t.app)
      .post('/api/auth/login')
      .set('Host', HOST)
      .set('Origin', 'http://evil.example')
      .send({ email: 'viewer@motewalk.local', password: 'demo-viewer-pass' });
    expect(res.status).toBe(403);
    expect(res.body.code).toBe('cross_origin');
  });

  it('stops guessing from one address with 429 after eight wrong passwords', async () => {
    const statuses: number[] = [];
    for (let i = 0; i < 12; i += 1) {
      const res = await t
        .anonymous()
        .post('/api/auth/login')
        .send({ email: 'operator@motewalk.local', password: `wrong-${i}-password` });
      statuses.push(res.status);
    }
    expect(statuses.slice(0, 8).every((s) => s === 401)).toBe(true);
    expect(statuses.slice(8)).toEqual([429, 429, 429, 429]);
    const last = await t.anonymous().post('/api/auth/login').send({ email: 'operator@motewalk.local', password: 'demo-operator-pass' });
    expect(last.status).toBe(429);
    expect(last.body.message).toMatch(/Too many failed sign-in attempts/);
  }, 60_000);
});

describe('GET /api/auth/me and POST /api/auth/logout', () => {
  it('answers 401 when nobody is signed in', async () => {
    const res = await t.anonymous().get('/api/auth/me');
    expect(res.status).toBe(401);
    expect(res.body).toEqual({ code: 'unauthenticated', message: 'Sign in to continue' });
  });

  it('returns the signed-in person with a CSRF token, and forgets them after sign-out', async () => {
    const agent = await t.signIn('viewer');
    const me = await agent.get('/api/auth/me');
    expect(me.status).toBe(200);
    expect(me.body.user.role).toBe('viewer');
    expect(me.body.csrfToken).toMatch(/^[\w-]{20,}$/);
    expect(me.body.user).not.toHaveProperty('passwordHash');
    expect((await agent.post('/api/auth/logout')).status).toBe(204);
    expect((await agent.get('/api/auth/me')).status).toBe(401);
  });

  it('accepts a write without an Origin header when it carries the session CSRF token', async () => {
    const agent = await t.signIn('viewer');
    const { csrfToken } = (await agent.get('/api/auth/me')).body;
    const noOrigin = request(t.app);
    const cookie = (await agent.get('/api/auth/me')).request.cookies as unknown as string;
    const refused = await noOrigin.post('/api/auth/logout').set('Host', HOST).set('Cookie', cookie);
    expect(refused.status).toBe(403);
    const accepted = await request(t.app).post('/api/auth/logout').set('Host', HOST).set('Cookie', cookie).set('x-csrf-token', csrfToken);
    expect(accepted.status).toBe(204);
  });
});

describe('session cookie in production', () => {
  it('marks the cookie Secure, HttpOnly and SameSite=Lax behind a TLS proxy', async () => {
    const { createApp } = await import('../../server/app');
    const { createOutboxMailer } = await import('../../server/mail/mailer');
    const app = createApp({
      db: t.db,
      mailer: createOutboxMailer(t.db, 'x@y.z'),
      sessionSecret: 'production-secret-123',
      production: true,
      trustProxy: 1,
      publicUrl: `https://${HOST}`,
    });
    const res = await request(app)
      .post('/api/auth/login')
      .set('Host', HOST)
      .set('Origin', `https://${HOST}`)
      .set('X-Forwarded-Proto', 'https')
      .send({ email: 'admin@motewalk.local', password: 'demo-admin-pass' });
    expect(res.status).toBe(200);
    const cookie = String(res.headers['set-cookie']);
    expect(cookie).toMatch(/; Secure/i);
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=Lax/i);
  });
});
