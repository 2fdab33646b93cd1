import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { createTestApp, type TestApp } from '../helpers/test-app';

// Counts the costly hashes while still computing real ones.
const hashes = vi.hoisted(() => ({ count: 0 }));
vi.mock('../../server/auth/password', async (importOriginal) => {
  const real = await importOriginal<typeof import('../../server/auth/password')>();
  return {
    ...real,
    hashPassword: (password: string) => {
      hashes.count += 1;
      return real.hashPassword(password);
    },
  };
});

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

const token = (i: number) => `made-up-token-${String(i).padStart(3, '0')}-xxxxxxxxxxxx`;

describe('POST /api/auth/set-password', () => {
  it('checks the token before hashing, so a made-up token costs no hash', async () => {
    const before = hashes.count;
    const res = await t
      .anonymous()
      .post('/api/auth/set-password')
      .send({ token: token(0), password: 'a-perfectly-good-password' });
    expect(res.status).toBe(400);
    expect(res.body.code).toBe('invalid_token');
    expect(hashes.count).toBe(before);
  });

  it('hashes once for a real link', async () => {
    const admin = await t.signIn('admin');
    const id = await t.personId('operator');
    await admin.post(`/api/people/${id}/password-link`).send({});
    const mail = await t.db('outbox').where({ to_address: 'operator@motewalk.local' }).orderBy('id', 'desc').first();
    const real = /token=([\w-]+)/.exec(mail.text_body)![1];
    const before = hashes.count;
    const res = await t.anonymous().post('/api/auth/set-password').send({ token: real, password: 'demo-operator-pass' });
    expect(res.status).toBe(200);
    expect(hashes.count).toBe(before + 1);
  });

  it('answers 429 after ten attempts from one address', async () => {
    const statuses: number[] = [];
    for (let i = 1; i <= 11; i += 1)
      statuses.push(
        (
          await t
            .anonymous()
            .post('/api/auth/set-password')
            .send({ token: token(i), password: 'a-perfectly-good-password' })
        ).status,
      );
    // The two tests above already used two of the ten.
    expect(statuses.slice(0, 8).every((s) => s === 400)).toBe(true);
    expect(statuses.slice(8)).toEqual([429, 429, 429]);
    const refused = await t
      .anonymous()
      .post('/api/auth/set-password')
      .send({ token: token(99), password: 'a-perfectly-good-password' });
    expect(refused.body).toEqual({ code: 'too_many_attempts', message: expect.stringMatching(/Too many attempts to set a password/) });
  });
});
