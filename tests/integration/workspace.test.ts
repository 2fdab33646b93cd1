import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../helpers/test-app';
import { AGENT, ROOM_DATA, SITE, WORKSTATION_DATA, scenarioInput } from '../fixtures/workspace';

let t: TestApp;
let workstationId: number;
let agentId: number;

beforeAll(async () => {
  t = await createTestApp();
  const eng = await t.signIn('engineer');
  const site = await eng.post('/api/sites').send(SITE);
  const room = await eng.post('/api/rooms').send({ siteId: site.body.id, name: 'Grinding hall', data: ROOM_DATA });
  const ws = await eng.post('/api/workstations').send({ roomId: room.body.id, name: 'Bench 1', data: WORKSTATION_DATA });
  workstationId = ws.body.id;
  agentId = (await eng.post('/api/agents').send(AGENT)).body.id;
});
afterAll(() => t.close());

const count = async (table: string) => Number((await t.db(table).count({ n: '*' }))[0].n);

describe('places and dust agents', () => {
  it('answers 401 to anonymous, 403 to operators, and 403 to viewers who write', async () => {
    expect((await t.anonymous().get('/api/sites')).status).toBe(401);
    expect((await (await t.signIn('operator')).get('/api/sites')).status).toBe(403);
    expect((await (await t.signIn('operator')).get('/api/agents')).status).toBe(403);
    const viewer = await t.signIn('viewer');
    expect((await viewer.post('/api/sites').send(SITE)).status).toBe(403);
    expect((await viewer.post('/api/agents').send(AGENT)).status).toBe(403);
    expect((await viewer.get('/api/sites')).status).toBe(200);
  });

  it('returns the site tree with rooms and workstations for a viewer', async () => {
    const viewer = await t.signIn('viewer');
    const res = await viewer.get('/api/sites');
    expect(res.body.items[0].rooms[0].workstations[0]).toMatchObject({ id: workstationId, name: 'Bench 1' });
  });

  it('refuses a workstation outside its room with the field path, storing nothing', async () => {
    const eng = await t.signIn('engineer');
    const roomId = (await t.db('rooms').first()).id;
    const before = await count('workstations');
    const res = await eng
      .post('/api/workstations')
      .send({ roomId, name: 'Too far', data: { ...WORKSTATION_DATA, worker: { ...WORKSTATION_DATA.worker, x_m: 30 } } });
    expect(res.status).toBe(400);
    expect(res.body.issues).toContainEqual({ path: 'body.data.worker.x_m', message: 'Must be within the room length (8 m), got 30' });
    expect(await count('workstations')).toBe(before);
  });

  it('refuses a dust agent with impossible values, naming each field', async () => {
    const eng = await t.signIn('engineer');
    const res = await eng.post('/api/agents').send({ name: '', data: { ...AGENT.data, density_kgPerM3: -1, shapeFactor: 0.5 } });
    expect(res.status).toBe(400);
    expect(res.body.issues.map((i: { path: string }) => i.path).sort()).toEqual([
      'body.data.density_kgPerM3',
      'body.data.shapeFactor',
      'body.name',
    ]);
  });

  it('records a limit override with its reason in the audit log', async () => {
    const eng = await t.signIn('engineer');
    const res = await eng.put(`/api/agents/${agentId}`).send({
      version: 1,
      name: AGENT.name,
      data: { ...AGENT.data, override: { limit8h_mgPerM3: 0.05, reason: 'Site follows the OSHA PEL' } },
    });
    expect(res.status).toBe(200);
    expect(res.body.data.override.limit8h_mgPerM3).toBe(0.05);
    const audit = await t.db('audit_log').where({ action: 'agent.limit_overridden' }).first();
    expect(JSON.parse(audit.detail).override.reason).toBe('Site follows the OSHA PEL');
  });
});

describe('scenarios', () => {
  let scenarioId: number;

  it('refuses a scenario whose hood lies outside the room, with the path and value', async () => {
    const eng = await t.signIn('engineer');
    const bad = scenarioInput();
    bad.hoods![0].x_m = 40;
    const res = await eng.post('/api/scenarios').send({ workstationId, agentId, name: 'Bad', input: bad });
    expect(res.status).toBe(400);
    expect(res.body.issues).toContainEqual(expect.objectContaining({ path: 'body.input.hoods.0.x_m' }));
    expect(res.body.issues[0].message).toMatch(/40/);
    expect(await count('scenarios')).toBe(0);
  });

  it('creates a scenario, stores its input and writes the audit log', async () => {
    const eng = await t.signIn('engineer');
    const res = await eng
      .post('/api/scenarios')
      .send({ workstationId, agentId, name: 'Flanged hood 0.3 m³/s', controlTier: 'engineering', input: scenarioInput() });
    expect(res.status).toBe(201);
    scenarioId = res.body.id;
    expect(res.body).toMatchObject({
      name: 'Flanged hood 0.3 m³/s',
      version: 1,
      status: 'draft',
      workstationName: 'Bench 1',
      agentName: 'Test quartz',
      lastRun: null,
    });
    const row = await t.db('scenarios').where({ id: scenarioId }).first();
    expect(JSON.parse(row.input).hoods[0].airflow_m3PerS).toBe(0.3);
    expect(
      await t
        .db('audit_log')
        .where({ action: 'scenario.created', target_id: String(scenarioId) })
        .first(),
    ).toBeTruthy();
  });

  it('saves an edit with the right version and answers 409 with the current version to a stale one', async () => {
    const eng = await t.signIn('engineer');
    const first = await eng.patch(`/api/scenarios/${scenarioId}`).send({ version: 1, name: 'Flanged hood, renamed' });
    expect(first.status).toBe(200);
    expect(first.body.version).toBe(2);
    // A name-only edit leaves the agent and the control as they were (defaults must not reset them).
    expect(first.body).toMatchObject({ agentId, agentName: 'Test quartz', controlTier: 'engineering' });
    const stale = await eng.patch(`/api/scenarios/${scenarioId}`).send({ version: 1, name: 'Lost edit?' });
    expect(stale.status).toBe(409);
    expect(stale.body.code).toBe('version_conflict');
    expect(stale.body.current).toMatchObject({ version: 2, name: 'Flanged hood, renamed' });
    expect((await t.db('scenarios').where({ id: scenarioId }).first()).name).toBe('Flanged hood, renamed');
  });

  it('lists scenarios sorted and filtered on the server, and refuses an unknown sort', async () => {
    const eng = await t.signIn('engineer');
    await eng.post(`/api/scenarios/${scenarioId}/duplicate`).send({ name: 'A second option' });
    const viewer = await t.signIn('viewer');
    const res = await viewer.get(`/api/scenarios?sort=name&order=asc&workstationId=${workstationId}`);
    expect(res.status).toBe(200);
    expect(res.body.items.map((s: { name: string }) => s.name)).toEqual(['A second option', 'Flanged hood, renamed']);
    const bad = await viewer.get('/api/scenarios?sort=password');
    expect(bad.status).toBe(400);
    expect(bad.body.issues[0].path).toBe('query.sort');
  });

  it('lets a viewer read but not edit, duplicate or delete', async () => {
    const viewer = await t.signIn('viewer');
    expect((await viewer.get(`/api/scenarios/${scenarioId}`)).status).toBe(200);
    expect((await viewer.patch(`/api/scenarios/${scenarioId}`).send({ version: 2, name: 'x' })).status).toBe(403);
    expect((await viewer.post(`/api/scenarios/${scenarioId}/duplicate`).send({})).status).toBe(403);
    expect((await viewer.delete(`/api/scenarios/${scenarioId}`)).status).toBe(403);
    expect((await (await t.signIn('operator')).get(`/api/scenarios/${scenarioId}`)).status).toBe(403);
  });

  it('soft-deletes a draft so its rows stay in the database', async () => {
    const eng = await t.signIn('engineer');
    const dup = await eng.post(`/api/scenarios/${scenarioId}/duplicate`).send({});
    expect((await eng.delete(`/api/scenarios/${dup.body.id}`)).status).toBe(204);
    expect((await eng.get(`/api/scenarios/${dup.body.id}`)).status).toBe(404);
    expect((await t.db('scenarios').where({ id: dup.body.id }).first()).deleted_at).not.toBeNull();
  });
});

describe('the site tree', () => {
  it('lists each live workstation once, under its own room, even when it has scenarios and an operator', async () => {
    const eng = await t.signIn('engineer');
    const siteId = (await t.db('sites').first()).id;
    const room = await eng.post('/api/rooms').send({ siteId, name: 'Polishing hall', data: ROOM_DATA });
    await eng.post('/api/workstations').send({ roomId: room.body.id, name: 'Bench 3', data: WORKSTATION_DATA });
    await eng.post('/api/workstations').send({ roomId: room.body.id, name: 'Bench 4', data: WORKSTATION_DATA });
    await t.db('workstation_operators').insert({ workstation_id: workstationId, person_id: await t.personId('operator') });
    const tree = (await (await t.signIn('viewer')).get('/api/sites')).body.items as {
      rooms: { id: number; workstations: { id: number; roomId: number }[] }[];
    }[];
    const listed = tree.flatMap((s) =>
      s.rooms.flatMap((r) => r.workstations.map((w) => ({ id: w.id, roomId: w.roomId, underRoom: r.id }))),
    );
    // The database itself is the reference: one entry per live workstation row.
    const rows = await t.db('workstations').whereNull('deleted_at').select('id', 'room_id');
    expect(rows.length).toBeGreaterThanOrEqual(3);
    expect(listed.map((w) => w.id).sort((a, b) => a - b)).toEqual(rows.map((r) => r.id).sort((a, b) => a - b));
    for (const w of listed) expect(w.underRoom).toBe(w.roomId);
  });
});
