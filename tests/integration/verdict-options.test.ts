import fs from 'node:fs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../helpers/test-app';
import { ticketedRun } from '../helpers/run-engine';
import { ROOM_DATA, SITE, WORKSTATION_DATA } from '../fixtures/workspace';
import type { ScenarioInput } from '../../shared/schemas/scenario';

const demo = (file: string, patch: (s: ScenarioInput) => ScenarioInput): ScenarioInput => {
  const s = JSON.parse(fs.readFileSync(new URL(`../../shared/demo-scenarios/${file}.json`, import.meta.url), 'utf8')) as ScenarioInput;
  return patch({ ...s, run: { ...s.run, particles: 2000 } });
};
// Invented limits for the rule under test; the 15-min one set low enough that the no-control peak is above it.
const AGENT = {
  name: 'Quartz with a short-term limit',
  data: {
    density_kgPerM3: 2650,
    shapeFactor: 1.2,
    limitFraction: 'respirable',
    limit8h_mgPerM3: 0.025,
    limit15min_mgPerM3: 0.05,
    jurisdiction: 'Test',
    limitSource: 'Test limit',
    limitDate: '2024',
  },
};

let t: TestApp;
let workstationId: number;
let agentId: number;

beforeAll(async () => {
  t = await createTestApp();
  const eng = await t.signIn('engineer');
  const site = await eng.post('/api/sites').send(SITE);
  const room = await eng.post('/api/rooms').send({ siteId: site.body.id, name: 'Hall', data: ROOM_DATA });
  workstationId = (await eng.post('/api/workstations').send({ roomId: room.body.id, name: 'Bench', data: WORKSTATION_DATA })).body.id;
  agentId = (await eng.post('/api/agents').send(AGENT)).body.id;
});
afterAll(() => t.close());

async function save(input: ScenarioInput) {
  const eng = await t.signIn('engineer');
  const sc = await eng.post('/api/scenarios').send({ workstationId, agentId, name: 'Grinding', input });
  const run = await ticketedRun(eng, sc.body.id, input);
  const res = await eng.post(`/api/scenarios/${sc.body.id}/runs`).send(run.body);
  return { res, run };
}

describe('the server judges with the scenario’s day-to-day GSD and the agent’s 15-min limit', () => {
  it('uses the GSD the scenario sets, stores it with the verdict numbers, and reads it back on every judgement', async () => {
    const { res } = await save(demo('stone-bench-no-control', (s) => ({ ...s, worker: { ...s.worker, dayToDayGsd: 1.8 } })));
    expect(res.status).toBe(201);
    expect(res.body.result.limit.gsd).toBe(1.8);
    const row = await t.db('runs').where({ id: res.body.id }).first();
    expect(JSON.parse(row.verdict_numbers).gsd).toBe(1.8);
    const viewer = await t.signIn('viewer');
    expect((await viewer.get(`/api/runs/${res.body.id}`)).body.result.limit.gsd).toBe(1.8);
  });

  it('keeps the default GSD, 2.7 (Buringh & Lanting), when the scenario leaves it blank', async () => {
    const { res } = await save(demo('stone-bench-no-control', (s) => s));
    expect(res.body.result.limit.gsd).toBe(2.7);
  });

  it('compares the peak 15-min average with the agent’s short-term limit and gives its share', async () => {
    const { res, run } = await save(demo('stone-bench-no-control', (s) => s));
    const peak = (run.result as { breathingZone: { fractions: { respirable: { peak15min_mgPerM3: number } } } }).breathingZone.fractions
      .respirable.peak15min_mgPerM3;
    expect(res.body.result.limit.shortTerm).toMatchObject({ value_mgPerM3: 0.05 });
    expect(res.body.result.limit.shortTerm.percentOfLimit).toBeCloseTo((100 * peak) / 0.05, 9);
    expect(['no', 'maybe', 'yes']).toContain(res.body.result.limit.shortTerm.exceeds);
  });
});
