import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../server/app';
import { createOutboxMailer } from '../../server/mail/mailer';
import { createTestApp, HOST, ORIGIN, type TestApp } from '../helpers/test-app';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

// A fresh app per test, so one test's failures never count against the next.
function appWith(opts: { trustProxy?: number; loginDelay?: Parameters<typeof createApp>[0]['loginDelay'] }) {
  return createApp({
    db: t.db,
    mailer: createOutboxMailer(t.db, 'x@y.z'),
    sessionSecret: 'sign-in-limits-secret',
    publicUrl: ORIGIN,
    ...opts,
  });
}
const NO_DELAY = { freeFailures: 1000, baseDelayMs: 0, maxDelayMs: 0, windowMs: 60_000 };

const login = (app: ReturnType<typeof createApp>, email: string, password: string, forwardedFor?: string) => {
  const req = request(app).post('/api/auth/login').set('Host', HOST).set('Origin', ORIGIN);
  if (forwardedFor) req.set('X-Forwarded-For', forwardedFor);
  return req.send({ email, password });
};

describe('the per-address sign-in limit with TRUST_PROXY off (the default)', () => {
  it('ignores a spoofed X-Forwarded-For: thirty failures from one socket give 429 whatever the header says', async () => {
    const app = appWith({ loginDelay: NO_DELAY });
    const statuses: number[] = [];
    for (let i = 0; i < 32; i += 1)
      statuses.push((await login(app, `nobody-${i}@motewalk.local`, 'wrong-password-x', `198.51.100.${i}`)).status);
    expect(statuses.slice(0, 30).every((s) => s === 401)).toBe(true);
    expect(statuses.slice(30)).toEqual([429, 429]);
  });

  it('believes the header only when a proxy is configured, so the same requests then count per forwarded address', async () => {
    const app = appWith({ trustProxy: 1, loginDelay: NO_DELAY });
    const statuses: number[] = [];
    for (let i = 0; i < 32; i += 1)
      statuses.push((await login(app, `nobody-${i}@motewalk.local`, 'wrong-password-x', `198.51.100.${i}`)).status);
    expect(statuses.every((s) => s === 401)).toBe(true);
  });
});

describe('per-account throttling', () => {
  it('locks out the guessing address but lets the owner sign in from another', async () => {
    const app = appWith({ trustProxy: 1, loginDelay: NO_DELAY });
    const attacker = '203.0.113.66';
    const statuses: number[] = [];
    for (let i = 0; i < 10; i += 1) statuses.push((await login(app, 'admin@motewalk.local', `guess-${i}-password`, attacker)).status);
    expect(statuses.slice(0, 8).every((s) => s === 401)).toBe(true);
    expect(statuses.slice(8)).toEqual([429, 429]);
    expect((await login(app, 'admin@motewalk.local', 'demo-admin-pass', attacker)).status).toBe(429);
    const owner = await login(app, 'admin@motewalk.local', 'demo-admin-pass', '192.0.2.10');
    expect(owner.status).toBe(200);
    expect(owner.body.user.role).toBe('admin');
  });

  it('makes each further wrong password on an account wait longer, wherever it comes from, and the owner still gets in', async () => {
    const app = appWith({ trustProxy: 1, loginDelay: { freeFailures: 1, baseDelayMs: 150, maxDelayMs: 600, windowMs: 60_000 } });
    const took: number[] = [];
    for (let i = 0; i < 5; i += 1) {
      const started = Date.now();
      const res = await login(app, 'viewer@motewalk.local', `guess-${i}-password`, `203.0.113.${i + 1}`);
      took.push(Date.now() - started);
      expect(res.status).toBe(401);
    }
    // Waits before each attempt: 0, 150, 300, 600 (the cap), 600 ms; timing only ever adds, so these are floors.
    expect(took[1]).toBeGreaterThanOrEqual(140);
    expect(took[2]).toBeGreaterThanOrEqual(290);
    expect(took[3]).toBeGreaterThanOrEqual(590);
    expect(took[4]).toBeGreaterThanOrEqual(590);
    const started = Date.now();
    const owner = await login(app, 'viewer@motewalk.local', 'demo-viewer-pass', '192.0.2.20');
    expect(owner.status).toBe(200);
    expect(Date.now() - started).toBeGreaterThanOrEqual(590);
    // A successful sign-in clears the account's count: the next typo costs nothing again.
    const afterwards = Date.now();
    expect((await login(app, 'viewer@motewalk.local', 'typo-password-1', '192.0.2.20')).status).toBe(401);
    expect(Date.now() - afterwards).toBeLessThan(590);
  });
});
