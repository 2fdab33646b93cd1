import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startSessionPruning } from '../../server/auth/session-lifetime';
import { createTestApp, ORIGIN, type TestApp } from '../helpers/test-app';
import { AGENT, ROOM_DATA, SITE, WORKSTATION_DATA, scenarioInput } from '../fixtures/workspace';

let t: TestApp;
let scenarioId = 0;
let workstationId = 0;
beforeAll(async () => {
  t = await createTestApp();
  const engineer = await t.signIn('engineer');
  const site = await engineer.post('/api/sites').send(SITE);
  const room = await engineer.post('/api/rooms').send({ siteId: site.body.id, name: 'Hall', data: ROOM_DATA });
  workstationId = (await engineer.post('/api/workstations').send({ roomId: room.body.id, name: 'Bench', data: WORKSTATION_DATA })).body.id;
  const agentId = (await engineer.post('/api/agents').send(AGENT)).body.id;
  const created = await engineer.post('/api/scenarios').send({ workstationId, agentId, name: 'Shared option', input: scenarioInput() });
  expect(created.status).toBe(201);
  scenarioId = created.body.id;
});
afterAll(() => t.close());

const lastMailTo = async (to: string) => (await t.db('outbox').where({ to_address: to }).orderBy('id', 'desc').first()).text_body as string;

describe('e-mailed links', () => {
  it('come from the configured public address even when the request names another host', async () => {
    const viewer = await t.signIn('viewer');
    const res = await viewer
      .post(`/api/scenarios/${scenarioId}/share`)
      .set('Host', 'evil.example')
      .set('Origin', 'http://evil.example')
      .send({ email: 'reader@example.org' });
    expect(res.status).toBe(202);
    const text = await lastMailTo('reader@example.org');
    expect(text).toContain(`${ORIGIN}/reports/${scenarioId}`);
    expect(text).not.toContain('evil.example');

    const admin = await t.signIn('admin');
    const viewerId = await t.personId('viewer');
    const reset = await admin
      .post(`/api/people/${viewerId}/password-link`)
      .set('Host', 'evil.example')
      .set('Origin', 'http://evil.example');
    expect(reset.status).toBe(202);
    const resetText = await lastMailTo('viewer@motewalk.local');
    expect(resetText).toContain(`${ORIGIN}/set-password?token=`);
    expect(resetText).not.toContain('evil.example');
  });

  it('are limited to 20 shared reports per person per hour, with a 429 that says so', async () => {
    const engineer = await t.signIn('engineer');
    const statuses: number[] = [];
    for (let i = 0; i < 22; i += 1)
      statuses.push((await engineer.post(`/api/scenarios/${scenarioId}/share`).send({ email: `r${i}@example.org` })).status);
    expect(statuses.slice(0, 20).every((s) => s === 202)).toBe(true);
    expect(statuses.slice(20)).toEqual([429, 429]);
    const refused = await engineer.post(`/api/scenarios/${scenarioId}/share`).send({ email: 'one-more@example.org' });
    expect(refused.body).toEqual({ code: 'too_many_mails', message: expect.stringMatching(/20 reports in the last hour/) });
    expect(await t.db('outbox').where({ to_address: 'one-more@example.org' }).first()).toBeUndefined();
    // Another person's allowance is their own.
    const admin = await t.signIn('admin');
    expect((await admin.post(`/api/scenarios/${scenarioId}/share`).send({ email: 'boss@example.org' })).status).toBe(202);
  });
});

describe('a password reset', () => {
  it('ends every session of that person and no one else’s', async () => {
    const viewerId = await t.personId('viewer');
    const office = await t.signIn('viewer');
    const laptop = await t.signIn('viewer');
    const engineer = await t.signIn('engineer');
    expect((await office.get('/api/auth/me')).status).toBe(200);
    const sessionsOfViewer = () => t.db('sessions').whereRaw("json_extract(sess, '$.passport.user') = ?", [viewerId]);
    const before = (await sessionsOfViewer()).length;
    expect(before).toBeGreaterThanOrEqual(2);
    const admin = await t.signIn('admin');
    expect((await admin.post(`/api/people/${viewerId}/password-link`).send({})).status).toBe(202);
    const token = /token=([\w-]+)/.exec(await lastMailTo('viewer@motewalk.local'))![1];
    const set = await t.anonymous().post('/api/auth/set-password').send({ token, password: 'a-fresh-viewer-password' });
    expect(set.status).toBe(200);

    expect((await office.get('/api/auth/me')).status).toBe(401);
    expect((await laptop.get('/api/auth/me')).status).toBe(401);
    expect((await engineer.get('/api/auth/me')).status).toBe(200);
    expect(await sessionsOfViewer()).toEqual([]);
    const audit = await t
      .db('audit_log')
      .where({ action: 'person.password_set', target_id: String(viewerId) })
      .orderBy('id', 'desc')
      .first();
    expect(JSON.parse(audit.detail)).toEqual({ sessionsEnded: before });
    const login = await t.anonymous().post('/api/auth/login').send({ email: 'viewer@motewalk.local', password: 'a-fresh-viewer-password' });
    expect(login.status).toBe(200);
    // Put the demo password back for the tests after this one.
    await admin.post(`/api/people/${viewerId}/password-link`).send({});
    const again = /token=([\w-]+)/.exec(await lastMailTo('viewer@motewalk.local'))![1];
    expect((await t.anonymous().post('/api/auth/set-password').send({ token: again, password: 'demo-viewer-pass' })).status).toBe(200);
  });

  it('refuses a password shorter than 12 characters or made only of spaces, with the field path', async () => {
    const admin = await t.signIn('admin');
    const viewerId = await t.personId('viewer');
    await admin.post(`/api/people/${viewerId}/password-link`).send({});
    const token = /token=([\w-]+)/.exec(await lastMailTo('viewer@motewalk.local'))![1];
    for (const password of ['elevenchars', ' '.repeat(12), ' '.repeat(10), '\t'.repeat(14)]) {
      const res = await t.anonymous().post('/api/auth/set-password').send({ token, password });
      expect(res.status).toBe(400);
      expect(new Set(res.body.issues.map((i: { path: string }) => i.path))).toEqual(new Set(['body.password']));
    }
    expect((await t.anonymous().post('/api/auth/set-password').send({ token, password: 'twelve chars' })).status).toBe(200);
    await admin.post(`/api/people/${viewerId}/password-link`).send({});
    const again = /token=([\w-]+)/.exec(await lastMailTo('viewer@motewalk.local'))![1];
    expect((await t.anonymous().post('/api/auth/set-password').send({ token: again, password: 'demo-viewer-pass' })).status).toBe(200);
  });
});

describe('session lifetime', () => {
  const ageSession = async (signedInAgo_ms: number) => {
    const rows = await t.db('sessions').select('sid', 'sess');
    for (const row of rows) {
      const sess = JSON.parse(row.sess);
      if (sess.signedInAt)
        await t
          .db('sessions')
          .where({ sid: row.sid })
          .update({ sess: JSON.stringify({ ...sess, signedInAt: Date.now() - signedInAgo_ms }) });
    }
  };

  it('ends a session 12 hours after sign-in however busy it was, but not at 11 hours', async () => {
    await t.db('sessions').delete();
    const agent = await t.signIn('engineer');
    await ageSession(11 * 3600 * 1000);
    expect((await agent.get('/api/auth/me')).status).toBe(200);
    await ageSession(12 * 3600 * 1000 + 1000);
    expect((await agent.get('/api/auth/me')).status).toBe(401);
    expect((await agent.get('/api/scenarios')).status).toBe(401);
  });

  it('prunes expired sessions from the table and keeps live ones', async () => {
    const past = new Date(Date.now() - 60_000).toISOString();
    const future = new Date(Date.now() + 3600_000).toISOString();
    await t.db('sessions').insert([
      { sid: 'expired-one', sess: '{"cookie":{}}', expired: past },
      { sid: 'live-one', sess: '{"cookie":{}}', expired: future },
    ]);
    const stop = startSessionPruning(t.db, 60_000);
    await expect
      .poll(async () => (await t.db('sessions').whereIn('sid', ['expired-one', 'live-one']).pluck('sid')).sort())
      .toEqual(['live-one']);
    stop();
  });
});

describe('request bodies and response headers', () => {
  const nested = (depth: number) => '['.repeat(depth) + ']'.repeat(depth);

  it('answers 400 with the one error shape to JSON nested deeper than 64 levels, on plain and large-body routes', async () => {
    const engineer = await t.signIn('engineer');
    for (const [url, depth] of [
      ['/api/sites', 65],
      ['/api/sites', 4000],
      [`/api/scenarios/${scenarioId}/runs`, 4000],
      ['/api/auth/login', 100_000],
    ] as const) {
      const res = await engineer
        .post(url)
        .set('Content-Type', 'application/json')
        .send(`{"name":${nested(depth)}}`);
      expect(res.status, url).toBe(400);
      expect(res.body).toEqual({ code: 'bad_request', message: 'The request body is not valid: nested deeper than 64 levels' });
    }
    // At the limit the body is read, and the schema answers instead.
    const ok = await engineer
      .post('/api/sites')
      .set('Content-Type', 'application/json')
      .send(`{"name":${nested(63)}}`);
    expect(ok.status).toBe(400);
    expect(ok.body.code).toBe('invalid_input');
    const brackets = await engineer.post('/api/sites').send({ name: '[[[[{{{{'.repeat(12), data: {} });
    expect(brackets.status).toBe(201);
  });

  it('marks every /api response Cache-Control: no-store, refusals and unknown routes included', async () => {
    const engineer = await t.signIn('engineer');
    const responses = [
      await engineer.get('/api/health'),
      await engineer.get(`/api/scenarios/${scenarioId}`),
      await t.anonymous().get('/api/auth/me'),
      await engineer.get('/api/no-such-route'),
      await engineer.post('/api/sites').set('Content-Type', 'application/json').send('{"broken":'),
      await request(t.app).post('/api/sites').set('Origin', 'http://evil.example').send({}),
    ];
    expect(responses.map((r) => r.status)).toEqual([200, 200, 401, 404, 400, 403]);
    for (const r of responses) expect(r.headers['cache-control']).toBe('no-store');
  });
});

describe('scenario bounds', () => {
  it('refuses more than 5,000,000 particles, more than 24 h and strings over 200 characters, naming each field', async () => {
    const engineer = await t.signIn('engineer');
    const base = scenarioInput();
    const input = {
      ...base,
      name: 'n'.repeat(201),
      description: 'd'.repeat(900_000 / 1000),
      source: { ...base.source, emission: { kind: 'continuous', rate_mgPerMin: 5, taskDuration_min: 1441 } },
      dust: { ...base.dust, name: 'x'.repeat(201) },
      run: { particles: 5_000_001, duration_s: 86_401, seed: 's'.repeat(201) },
    };
    const res = await engineer.post('/api/scenarios').send({ workstationId, name: 'Too big', input });
    expect(res.status).toBe(400);
    expect(res.body.issues.map((i: { path: string }) => i.path).sort()).toEqual(
      [
        'body.input.description',
        'body.input.dust.name',
        'body.input.name',
        'body.input.run.duration_s',
        'body.input.run.particles',
        'body.input.run.seed',
        'body.input.source.emission.taskDuration_min',
      ].sort(),
    );
    expect(JSON.stringify(res.body).length).toBeLessThan(3000);
    expect(await t.db('scenarios').where({ name: 'Too big' }).first()).toBeUndefined();
  });

  it('accepts a scenario exactly at the bounds', async () => {
    const engineer = await t.signIn('engineer');
    const base = scenarioInput();
    const input = {
      ...base,
      name: 'n'.repeat(200),
      source: { ...base.source, emission: { kind: 'continuous', rate_mgPerMin: 5, taskDuration_min: 1440 } },
      run: { particles: 5_000_000, duration_s: 86_400, seed: 7 },
    };
    const res = await engineer.post('/api/scenarios').send({ workstationId, name: 'At the bounds', input });
    expect(res.status).toBe(201);
  });
});

describe('size-profile uploads', () => {
  it('refuses a CSV with more than 50 columns with a short 400', async () => {
    const engineer = await t.signIn('engineer');
    const header = Array.from({ length: 60_000 }, () => 'a').join(',');
    const res = await engineer
      .post('/api/size-profiles/upload')
      .field('format', 'impactor')
      .field('name', 'wide')
      .attach('file', Buffer.from(`${header}\n1,2\n`), 'wide.csv');
    expect(res.status).toBe(400);
    expect(res.body.code).toBe('too_many_columns');
    expect(res.body.message).toBe('Line 1 has 60000 columns; a size-profile file has at most 50');
    expect(res.text.length).toBeLessThan(500);
    const fifty = Array.from({ length: 51 }, (_, i) => `c${i}`).join(',');
    const justOver = await engineer
      .post('/api/size-profiles/upload')
      .field('format', 'impactor')
      .field('name', 'wide')
      .attach('file', Buffer.from(`${fifty}\n`), 'wide.csv');
    expect(justOver.status).toBe(400);
    expect(justOver.body.code).toBe('too_many_columns');
  });
});
