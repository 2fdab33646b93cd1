import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../helpers/test-app';
import { ROOM_DATA, SITE, WORKSTATION_DATA, scenarioInput } from '../fixtures/workspace';

let t: TestApp;
const ids = { site: 0, room: 0, workstation: 0 };

beforeAll(async () => {
  t = await createTestApp();
  const eng = await t.signIn('engineer');
  ids.site = (await eng.post('/api/sites').send(SITE)).body.id;
  ids.room = (await eng.post('/api/rooms').send({ siteId: ids.site, name: 'Grinding hall', data: ROOM_DATA })).body.id;
  ids.workstation = (await eng.post('/api/workstations').send({ roomId: ids.room, name: 'Bench 1', data: WORKSTATION_DATA })).body.id;
});
afterAll(() => t.close());

const row = async (table: 'sites' | 'rooms' | 'workstations', id: number) => {
  const r = await t.db(table).where({ id }).first();
  return { ...r, data: JSON.parse(r.data) };
};
const auditOf = (action: string, id: number) =>
  t
    .db('audit_log')
    .where({ action, target_id: String(id) })
    .orderBy('id', 'desc')
    .first();

describe('renaming and editing places', () => {
  it('answers 401 to anonymous callers and 403 to viewers for every edit and delete', async () => {
    const viewer = await t.signIn('viewer');
    for (const [url, body] of [
      [`/api/sites/${ids.site}`, { version: 1, ...SITE }],
      [`/api/rooms/${ids.room}`, { version: 1, name: 'x', data: ROOM_DATA }],
      [`/api/workstations/${ids.workstation}`, { version: 1, name: 'x', data: WORKSTATION_DATA }],
    ] as const) {
      expect([url, (await t.anonymous().put(url).send(body)).status]).toEqual([url, 401]);
      expect([url, (await viewer.put(url).send(body)).status]).toEqual([url, 403]);
      expect([url, (await viewer.delete(url)).status]).toEqual([url, 403]);
    }
    expect((await row('sites', ids.site)).version).toBe(1);
  });

  it('answers 400 with field paths for a bad edit and changes nothing', async () => {
    const eng = await t.signIn('engineer');
    const res = await eng.put(`/api/rooms/${ids.room}`).send({ name: '', data: { ...ROOM_DATA, height_m: -1 } });
    expect(res.status).toBe(400);
    expect(res.body.issues.map((i: { path: string }) => i.path).sort()).toEqual(['body.data.height_m', 'body.name', 'body.version']);
    expect(await row('rooms', ids.room)).toMatchObject({ name: 'Grinding hall', version: 1 });
  });

  it('renames a site at its version, stores it, and audits what changed', async () => {
    const eng = await t.signIn('engineer');
    const res = await eng.put(`/api/sites/${ids.site}`).send({ version: 1, name: 'North works', data: { address: '2 Test Lane' } });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ name: 'North works', version: 2 });
    expect(await row('sites', ids.site)).toMatchObject({ name: 'North works', version: 2, data: { address: '2 Test Lane' } });
    expect(JSON.parse((await auditOf('site.changed', ids.site)).detail)).toMatchObject({
      version: 2,
      changes: expect.arrayContaining([
        { field: 'name', from: 'Test works', to: 'North works' },
        { field: 'data.address', from: '1 Test Lane', to: '2 Test Lane' },
      ]),
    });
  });

  it('refuses a stale place save with 409 and the current record, keeping the newer save', async () => {
    const eng = await t.signIn('engineer');
    const stale = await eng.put(`/api/sites/${ids.site}`).send({ version: 1, name: 'Old name back', data: { address: '1 Test Lane' } });
    expect(stale.status).toBe(409);
    expect(stale.body).toMatchObject({ code: 'version_conflict', current: { id: ids.site, name: 'North works', version: 2 } });
    expect(await row('sites', ids.site)).toMatchObject({ name: 'North works', version: 2 });
    const ws = await eng.put(`/api/workstations/${ids.workstation}`).send({ version: 7, name: 'Bench 1', data: WORKSTATION_DATA });
    expect(ws.status).toBe(409);
    expect(ws.body.current).toMatchObject({ version: 1, name: 'Bench 1' });
  });

  it('edits a workstation to seated with a lower breathing zone and audits the change', async () => {
    const eng = await t.signIn('engineer');
    const data = { ...WORKSTATION_DATA, worker: { ...WORKSTATION_DATA.worker, z_m: 1.1, posture: 'seated' } };
    const res = await eng.put(`/api/workstations/${ids.workstation}`).send({ version: 1, name: 'Bench 1 (seated)', data });
    expect(res.status).toBe(200);
    expect(await row('workstations', ids.workstation)).toMatchObject({
      name: 'Bench 1 (seated)',
      version: 2,
      data: { worker: { z_m: 1.1, posture: 'seated' } },
    });
    expect(JSON.parse((await auditOf('workstation.changed', ids.workstation)).detail).changes).toEqual(
      expect.arrayContaining([{ field: 'data.worker.posture', from: 'standing', to: 'seated' }]),
    );
  });
});

describe('room ventilation as air changes or supply airflow', () => {
  it('keeps a supply airflow as entered and derives the air changes from the volume', async () => {
    const eng = await t.signIn('engineer');
    // 8 × 6 × 3 m = 144 m³; 576 m³/h over 144 m³ is 4 air changes per hour (definition of ACH).
    const data = { ...ROOM_DATA, airChanges_perH: undefined, ventilationEntered: 'supplyAirflow', supplyAirflow_m3PerH: 576 };
    const res = await eng.put(`/api/rooms/${ids.room}`).send({ version: 1, name: 'Grinding hall', data });
    expect(res.status).toBe(200);
    expect((await row('rooms', ids.room)).data).toMatchObject({
      ventilationEntered: 'supplyAirflow',
      supplyAirflow_m3PerH: 576,
      airChanges_perH: 4,
    });
  });

  it('derives the supply airflow for a room given in air changes', async () => {
    const eng = await t.signIn('engineer');
    const res = await eng.post('/api/rooms').send({ siteId: ids.site, name: 'Store', data: { ...ROOM_DATA, airChanges_perH: 2 } });
    expect(res.status).toBe(201);
    // 2 per hour × 144 m³ = 288 m³/h.
    expect((await row('rooms', res.body.id)).data).toMatchObject({
      ventilationEntered: 'airChanges',
      airChanges_perH: 2,
      supplyAirflow_m3PerH: 288,
    });
  });

  it('asks for the figure of the unit chosen, and refuses a supply above 200 air changes', async () => {
    const eng = await t.signIn('engineer');
    const missing = await eng
      .post('/api/rooms')
      .send({ siteId: ids.site, name: 'R', data: { ...ROOM_DATA, airChanges_perH: undefined, ventilationEntered: 'supplyAirflow' } });
    expect(missing.status).toBe(400);
    expect(missing.body.issues).toContainEqual({ path: 'body.data.supplyAirflow_m3PerH', message: 'Enter the supply airflow' });
    const huge = await eng.post('/api/rooms').send({
      siteId: ids.site,
      name: 'R',
      data: { ...ROOM_DATA, ventilationEntered: 'supplyAirflow', supplyAirflow_m3PerH: 144 * 201 },
    });
    expect(huge.status).toBe(400);
    expect(huge.body.issues[0].path).toBe('body.data.supplyAirflow_m3PerH');
  });

  it('refuses to shrink a room around one of its workstations, naming it', async () => {
    const eng = await t.signIn('engineer');
    const { version } = await row('rooms', ids.room);
    const res = await eng.put(`/api/rooms/${ids.room}`).send({ version, name: 'Grinding hall', data: { ...ROOM_DATA, width_m: 2 } });
    expect(res.status).toBe(400);
    expect(res.body.issues).toContainEqual({
      path: 'body.data.width_m',
      message: 'Bench 1 (seated): the source must be within the room width (2 m), got 3',
    });
    expect((await row('rooms', ids.room)).data.width_m).toBe(6);
  });
});

describe('soft-deleting places', () => {
  it('refuses to delete a workstation that still has a scenario, naming it, and deletes it once empty', async () => {
    const eng = await t.signIn('engineer');
    const s = await eng.post('/api/scenarios').send({ workstationId: ids.workstation, name: 'Hood A', input: scenarioInput() });
    const refused = await eng.delete(`/api/workstations/${ids.workstation}`);
    expect(refused.status).toBe(409);
    expect(refused.body).toMatchObject({ code: 'not_empty', children: ['Hood A'] });
    expect(refused.body.message).toMatch(/still has 1 scenario \(Hood A\)/);
    expect((await row('workstations', ids.workstation)).deleted_at).toBeNull();

    expect((await eng.delete(`/api/scenarios/${s.body.id}`)).status).toBe(204);
    expect((await eng.delete(`/api/workstations/${ids.workstation}`)).status).toBe(204);
    expect((await row('workstations', ids.workstation)).deleted_at).not.toBeNull();
    expect(JSON.parse((await auditOf('workstation.deleted', ids.workstation)).detail)).toEqual({ name: 'Bench 1 (seated)' });
  });

  it('hides a deleted workstation from the tree and pickers, and refuses new scenarios on it', async () => {
    const eng = await t.signIn('engineer');
    const tree = (await eng.get('/api/sites')).body.items;
    const listed = tree.flatMap((s: { rooms: { workstations: { id: number }[] }[] }) =>
      s.rooms.flatMap((r) => r.workstations.map((w) => w.id)),
    );
    expect(listed).not.toContain(ids.workstation);
    expect((await eng.get(`/api/workstations/${ids.workstation}`)).status).toBe(404);
    const s = await eng.post('/api/scenarios').send({ workstationId: ids.workstation, name: 'Late', input: scenarioInput() });
    expect(s.status).toBe(400);
    // The deleted scenario still points at its workstation: records are kept, not rewritten.
    expect(await t.db('scenarios').where({ workstation_id: ids.workstation }).count({ n: '*' })).toEqual([{ n: 1 }]);
  });

  it('refuses to delete a site that still has rooms, then deletes the emptied room and site', async () => {
    const eng = await t.signIn('engineer');
    const refused = await eng.delete(`/api/sites/${ids.site}`);
    expect(refused.status).toBe(409);
    expect(refused.body.children).toEqual(['Grinding hall', 'Store']);
    for (const r of await t.db('rooms').where({ site_id: ids.site })) expect((await eng.delete(`/api/rooms/${r.id}`)).status).toBe(204);
    expect((await eng.delete(`/api/sites/${ids.site}`)).status).toBe(204);
    expect((await eng.get('/api/sites')).body.items).toEqual([]);
    expect((await row('sites', ids.site)).deleted_at).not.toBeNull();
    expect(await auditOf('site.deleted', ids.site)).toBeTruthy();
  });

  it('answers 404 to a second delete and to an edit of a deleted place', async () => {
    const eng = await t.signIn('engineer');
    expect((await eng.delete(`/api/sites/${ids.site}`)).status).toBe(404);
    expect((await eng.put(`/api/sites/${ids.site}`).send({ version: 2, ...SITE })).status).toBe(404);
  });
});
