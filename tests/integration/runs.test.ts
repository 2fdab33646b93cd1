import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../helpers/test-app';
import { runEngine } from '../helpers/run-engine';
import { parseRunResult } from '../../shared/schemas/run-result-stored';
import { AGENT, ROOM_DATA, SITE, WORKSTATION_DATA, scenarioInput } from '../fixtures/workspace';

let t: TestApp;
let scenarioId: number;
let run: ReturnType<typeof runEngine>;

beforeAll(async () => {
  t = await createTestApp();
  const eng = await t.signIn('engineer');
  const site = await eng.post('/api/sites').send(SITE);
  const room = await eng.post('/api/rooms').send({ siteId: site.body.id, name: 'Hall', data: ROOM_DATA });
  const ws = await eng.post('/api/workstations').send({ roomId: room.body.id, name: 'Bench', data: WORKSTATION_DATA });
  const agent = await eng.post('/api/agents').send(AGENT);
  const sc = await eng
    .post('/api/scenarios')
    .send({ workstationId: ws.body.id, agentId: agent.body.id, name: 'Hood A', input: scenarioInput() });
  scenarioId = sc.body.id;
  run = runEngine(scenarioInput());
});
afterAll(() => t.close());

describe('POST /api/scenarios/:id/runs', () => {
  it('answers 401 to anonymous callers and 403 to viewers', async () => {
    const body = { scenarioVersion: 1, input: run.scenario, result: run.result };
    expect((await t.anonymous().post(`/api/scenarios/${scenarioId}/runs`).send(body)).status).toBe(401);
    expect((await (await t.signIn('viewer')).post(`/api/scenarios/${scenarioId}/runs`).send(body)).status).toBe(403);
  });

  it('answers 400 when the result lacks its summary, storing nothing', async () => {
    const eng = await t.signIn('engineer');
    const res = await eng
      .post(`/api/scenarios/${scenarioId}/runs`)
      .send({ scenarioVersion: 1, input: run.scenario, result: { engine: { version: 'x' } } });
    expect(res.status).toBe(400);
    expect(res.body.issues.some((i: { path: string }) => i.path.startsWith('body.result.breathingZone'))).toBe(true);
    expect(await t.db('runs').count({ n: '*' })).toEqual([{ n: 0 }]);
  });

  it('answers 400 naming the field when a list in the result is malformed', async () => {
    const eng = await t.signIn('engineer');
    const trajectories = { ...(run.result.trajectories as object), positions_m: [0, 'north', 1] };
    const res = await eng
      .post(`/api/scenarios/${scenarioId}/runs`)
      .send({ scenarioVersion: 1, input: run.scenario, result: { ...run.result, trajectories } });
    expect(res.status).toBe(400);
    expect(res.body.issues).toContainEqual({ path: 'body.result.trajectories.positions_m.1', message: 'must hold numbers, got "north"' });
    expect(await t.db('runs').count({ n: '*' })).toEqual([{ n: 0 }]);
  });

  it('saves an engine result with its summary columns, which the list then shows', async () => {
    const eng = await t.signIn('engineer');
    const res = await eng.post(`/api/scenarios/${scenarioId}/runs`).send({ scenarioVersion: 1, input: run.scenario, result: run.result });
    expect(res.status).toBe(201);
    const row = await t.db('runs').where({ id: res.body.id }).first();
    const respirable = (run.result.breathingZone as { fractions: { respirable: { twa8h_mgPerM3: number } } }).fractions.respirable;
    expect(row.respirable_twa8h_mgPerM3).toBeCloseTo(respirable.twa8h_mgPerM3, 12);
    expect(row.particles).toBe(400);
    expect(row.seed).toBe('7');
    expect(['clear', 'watch', 'act']).toContain(row.banner);
    const list = await (await t.signIn('viewer')).get('/api/scenarios');
    expect(list.body.items[0].lastRun).toMatchObject({ id: res.body.id, outOfDate: false, banner: row.banner });
    expect(await t.db('audit_log').where({ action: 'run.saved' }).first()).toBeTruthy();
    // Stored as plain lists (null for NaN), so the stored text reads back to the posted result.
    const stored = JSON.parse(row.result);
    expect(Array.isArray(stored.trajectories.positions_m)).toBe(true);
    expect(parseRunResult(stored)).toEqual(parseRunResult(run.result));
  });

  it('lets a viewer open a saved run without re-running, and marks it out of date after an edit', async () => {
    const viewer = await t.signIn('viewer');
    const runId = (await t.db('runs').first()).id;
    const before = await viewer.get(`/api/runs/${runId}`);
    expect(before.status).toBe(200);
    expect(before.body.outOfDate).toBe(false);
    // The whole stored series comes back (sparse 400-particle runs merge time bins, so its length varies).
    const storedSeries = JSON.parse((await t.db('runs').where({ id: runId }).first()).result).breathingZone.series.time_s;
    expect(storedSeries.length).toBeGreaterThan(0);
    expect(before.body.result.breathingZone.series.time_s).toEqual(storedSeries);
    const eng = await t.signIn('engineer');
    const changed = scenarioInput();
    changed.hoods![0].airflow_m3PerS = 0.5;
    expect((await eng.patch(`/api/scenarios/${scenarioId}`).send({ version: 1, input: changed })).status).toBe(200);
    const after = await viewer.get(`/api/runs/${runId}`);
    expect(after.body.outOfDate).toBe(true);
    expect((await viewer.get(`/api/scenarios/${scenarioId}`)).body.runs[0].outOfDate).toBe(true);
  });
});
