import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../helpers/test-app';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

describe('GET /api/audit', () => {
  it('answers 401 to anonymous callers', async () => {
    expect((await t.anonymous().get('/api/audit')).status).toBe(401);
  });

  it('answers 403 to an operator', async () => {
    const operator = await t.signIn('operator');
    expect((await operator.get('/api/audit')).status).toBe(403);
  });

  it('answers 400 for a bad filter', async () => {
    const viewer = await t.signIn('viewer');
    const res = await viewer.get('/api/audit?page=0');
    expect(res.status).toBe(400);
    expect(res.body.issues[0].path).toBe('query.page');
  });

  it('lets a viewer read sign-ins, newest first, filtered by action', async () => {
    await t.anonymous().post('/api/auth/login').send({ email: 'engineer@motewalk.local', password: 'wrong-password-1' });
    const viewer = await t.signIn('viewer');
    const res = await viewer.get('/api/audit?action=auth.sign_in_failed');
    expect(res.status).toBe(200);
    expect(res.body.items).toHaveLength(1);
    expect(res.body.items[0]).toMatchObject({ actorName: 'Tomas Okafor', actorEmail: null, action: 'auth.sign_in_failed' });
    const all = await viewer.get('/api/audit');
    expect(all.body.items[0].action).toBe('auth.signed_in');
  });
});

describe('who may see e-mail addresses in the audit trail', () => {
  let t2: TestApp;
  beforeAll(async () => {
    t2 = await createTestApp({ demoWorkspace: true, particles: 500 });
    const admin = await t2.signIn('admin');
    await admin.post('/api/people').send({ email: 'new.hire@motewalk.local', name: 'Noor Hassan', role: 'viewer' });
    await t2.anonymous().post('/api/auth/login').send({ email: 'nobody@elsewhere.example', password: 'wrong-password-1' });
  });
  afterAll(() => t2.close());

  it('gives a viewer names for the people and records, and no e-mail address anywhere', async () => {
    const viewer = await t2.signIn('viewer');
    const res = await viewer.get('/api/audit');
    expect(res.status).toBe(200);
    expect(JSON.stringify(res.body)).not.toMatch(/@/);
    const invited = res.body.items.find((i: { action: string }) => i.action === 'person.invited');
    expect(invited).toMatchObject({ actorName: 'Ilse Varga', actorEmail: null, targetType: 'person', targetName: 'Noor Hassan' });
    expect(invited.detail).toEqual({ emailName: 'Noor Hassan', role: 'viewer' });
    const stranger = res.body.items.find((i: { action: string }) => i.action === 'auth.sign_in_failed');
    expect(stranger).toMatchObject({ actorName: null, actorEmail: null });
    const created = res.body.items.find((i: { action: string }) => i.action === 'scenario.created');
    expect(created.targetName).toBe(created.detail.name);
  });

  it('gives an engineer names only too', async () => {
    const engineer = await t2.signIn('engineer');
    const res = await engineer.get('/api/audit');
    expect(JSON.stringify(res.body)).not.toMatch(/@/);
  });

  it('gives an admin the addresses beside the names', async () => {
    const admin = await t2.signIn('admin');
    const res = await admin.get('/api/audit');
    const invited = res.body.items.find((i: { action: string }) => i.action === 'person.invited');
    expect(invited).toMatchObject({ actorName: 'Ilse Varga', actorEmail: 'admin@motewalk.local', targetName: 'Noor Hassan' });
    expect(invited.detail).toMatchObject({ email: 'new.hire@motewalk.local', emailName: 'Noor Hassan' });
    const stranger = res.body.items.find((i: { action: string }) => i.action === 'auth.sign_in_failed');
    expect(stranger).toMatchObject({ actorName: null, actorEmail: 'nobody@elsewhere.example' });
  });

  it('finds a person by name for anyone, and by address only for an admin', async () => {
    const viewer = await t2.signIn('viewer');
    const byName = await viewer.get('/api/audit?actor=varga');
    expect(byName.body.items.length).toBeGreaterThan(0);
    for (const i of byName.body.items) expect(i.actorName).toBe('Ilse Varga');
    expect((await viewer.get('/api/audit?actor=admin@motewalk.local')).body.items).toHaveLength(0);
    const admin = await t2.signIn('admin');
    expect((await admin.get('/api/audit?actor=admin@motewalk.local')).body.items.length).toBeGreaterThan(0);
  });

  it('records what an edit changed, from and to', async () => {
    const engineer = await t2.signIn('engineer');
    const scenario = await t2.db('scenarios').orderBy('id').first();
    const res = await engineer.patch(`/api/scenarios/${scenario.id}`).send({
      version: scenario.version,
      name: 'Renamed option',
      // The editor sends every field; the update schema fills an absent one with its default.
      agentId: scenario.agent_id,
      controlDescription: scenario.control_description,
    });
    expect(res.status).toBe(200);
    const trail = await engineer.get('/api/audit?action=scenario.changed');
    expect(trail.body.items[0]).toMatchObject({ actorName: 'Tomas Okafor', targetName: 'Renamed option' });
    expect(trail.body.items[0].detail.changes).toEqual([{ field: 'name', from: scenario.name, to: 'Renamed option' }]);
  });
});

describe('errors keep one shape', () => {
  it('answers an unknown API route with a JSON 404', async () => {
    const res = await t.anonymous().get('/api/no-such-thing');
    expect(res.status).toBe(404);
    expect(res.body.code).toBe('not_found');
  });

  it('answers malformed JSON with 400, not a crash', async () => {
    const res = await t.anonymous().post('/api/auth/login').set('Content-Type', 'application/json').send('{"email": ');
    expect(res.status).toBe(400);
    expect(res.body).toEqual({ code: 'bad_request', message: 'The request body is not valid JSON' });
  });

  it('answers an oversized body with 413', async () => {
    const res = await t
      .anonymous()
      .post('/api/auth/login')
      .send({ email: 'a@b.co', password: 'x'.repeat(2_000_000) });
    expect(res.status).toBe(413);
    expect(res.body.code).toBe('payload_too_large');
  });
});

describe('audit trail filtered by workstation', () => {
  it('lists what happened to a workstation and to its scenarios, and nothing else', async () => {
    const t2 = await createTestApp({ demoWorkspace: true, particles: 500 });
    try {
      const viewer = await t2.signIn('viewer');
      const ws = await t2.db('workstations').orderBy('id').first();
      const res = await viewer.get(`/api/audit?workstationId=${ws.id}`);
      expect(res.status).toBe(200);
      const actions = new Set(res.body.items.map((i: { action: string }) => i.action));
      expect(actions).toEqual(new Set(['workstation.created', 'scenario.created', 'run.saved']));
      const scenarioIds = (await t2.db('scenarios').where({ workstation_id: ws.id })).map((s) => String(s.id));
      for (const item of res.body.items) if (item.targetType === 'scenario') expect(scenarioIds).toContain(item.targetId);
    } finally {
      await t2.close();
    }
  });
});
