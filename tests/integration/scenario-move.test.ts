import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../helpers/test-app';
import { saveLowEnergyRun } from '../helpers/run-engine';

let t: TestApp;
let benchId: number;
let otherBenchId: number;
const scenarioAt = async (ws: number, name: string) => t.db('scenarios').where({ workstation_id: ws, name }).first();
const boardOf = async (ws: number) => {
  const { checkedAt: _when, ...board } = (await (await t.signIn('admin')).get(`/api/boards/${ws}`)).body;
  return board;
};

beforeAll(async () => {
  t = await createTestApp({ demoWorkspace: true, particles: 2000 });
  const wss = await t.db('workstations').orderBy('id');
  benchId = wss[0].id;
  otherBenchId = wss[1].id;
});
afterAll(() => t.close());

describe('moving a scenario to another workstation', () => {
  it('moves a draft option, and the audit trail names both workstations', async () => {
    const eng = await t.signIn('engineer');
    const s = await scenarioAt(benchId, 'No control');
    const res = await eng.patch(`/api/scenarios/${s.id}`).send({ version: s.version, workstationId: otherBenchId });
    expect(res.status).toBe(200);
    expect((await t.db('scenarios').where({ id: s.id }).first()).workstation_id).toBe(otherBenchId);
    const audit = await t
      .db('audit_log')
      .where({ action: 'scenario.changed', target_id: String(s.id) })
      .first();
    expect(JSON.parse(audit.detail).workstationId).toEqual({ from: benchId, to: otherBenchId });
  });

  it('refuses to move the approved option with 409, and the old station keeps its board and approval', { timeout: 120_000 }, async () => {
    const eng = await t.signIn('engineer');
    const slot = await scenarioAt(benchId, 'Slot hood');
    const { run } = await saveLowEnergyRun(eng, slot.id, 2000);
    expect((await eng.post(`/api/scenarios/${slot.id}/approve`).send({ runId: run.body.id })).status).toBe(201);
    const before = await boardOf(benchId);
    expect(before).toMatchObject({ control: 'Slot hood' });
    expect(before.banner).not.toBe('act');
    const approved = await scenarioAt(benchId, 'Slot hood');

    const res = await eng.patch(`/api/scenarios/${slot.id}`).send({ version: approved.version, workstationId: otherBenchId });
    expect(res.status).toBe(409);
    expect(res.body).toMatchObject({ code: 'approved' });
    expect(res.body.message).toMatch(/stays with the workstation it was approved for/);

    expect(await t.db('scenarios').where({ id: slot.id }).first()).toMatchObject({
      workstation_id: benchId,
      status: 'approved',
      version: approved.version,
    });
    expect(await boardOf(benchId)).toEqual(before);
    expect((await boardOf(otherBenchId)).control).not.toBe('Slot hood');
    expect(await t.db('approvals').where({ workstation_id: benchId }).whereNull('superseded_at').count({ n: '*' })).toEqual([{ n: 1 }]);
  });

  it('still lets the approved option be edited where it is', async () => {
    const eng = await t.signIn('engineer');
    const slot = await scenarioAt(benchId, 'Slot hood');
    const res = await eng
      .patch(`/api/scenarios/${slot.id}`)
      .send({ version: slot.version, workstationId: benchId, name: 'Slot hood (renamed)' });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ workstationId: benchId, status: 'approved', name: 'Slot hood (renamed)' });
  });

  it('lets a duplicate of the approved option go to the other workstation as a draft', async () => {
    const eng = await t.signIn('engineer');
    const slot = await t.db('scenarios').where({ workstation_id: benchId, status: 'approved' }).first();
    const copy = (await eng.post(`/api/scenarios/${slot.id}/duplicate`).send({ name: 'Slot hood for the other bench' })).body;
    const res = await eng.patch(`/api/scenarios/${copy.id}`).send({ version: copy.version, workstationId: otherBenchId });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ workstationId: otherBenchId, status: 'draft' });
    expect((await boardOf(benchId)).control).toBe('Slot hood (renamed)');
  });
});
