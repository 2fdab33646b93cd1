import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../helpers/test-app';
import { runEngine, saveTicketedRun, ticketedRun } from '../helpers/run-engine';
import { packResult, unpackResult } from '../../server/scenarios/stored-result';
import { ENGINE_VERSION } from '../../workers/engine/index';
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
    const body = { scenarioVersion: 1, ticket: '0'.repeat(32), input: run.scenario, result: run.result };
    expect((await t.anonymous().post(`/api/scenarios/${scenarioId}/runs`).send(body)).status).toBe(401);
    expect((await (await t.signIn('viewer')).post(`/api/scenarios/${scenarioId}/runs`).send(body)).status).toBe(403);
  });

  it('answers 400 when the result lacks its summary, storing nothing', async () => {
    const eng = await t.signIn('engineer');
    const res = await eng
      .post(`/api/scenarios/${scenarioId}/runs`)
      .send({ scenarioVersion: 1, ticket: '0'.repeat(32), input: run.scenario, result: { engine: { version: 'x' } } });
    expect(res.status).toBe(400);
    expect(res.body.issues.some((i: { path: string }) => i.path.startsWith('body.result.breathingZone'))).toBe(true);
    expect(await t.db('runs').count({ n: '*' })).toEqual([{ n: 0 }]);
  });

  it('answers 400 naming the field when a list in the result is malformed', async () => {
    const eng = await t.signIn('engineer');
    const trajectories = { ...(run.result.trajectories as object), positions_m: [0, 'north', 1] };
    const res = await eng
      .post(`/api/scenarios/${scenarioId}/runs`)
      .send({ scenarioVersion: 1, ticket: '0'.repeat(32), input: run.scenario, result: { ...run.result, trajectories } });
    expect(res.status).toBe(400);
    expect(res.body.issues).toContainEqual({ path: 'body.result.trajectories.positions_m.1', message: 'must hold numbers, got "north"' });
    expect(await t.db('runs').count({ n: '*' })).toEqual([{ n: 0 }]);
  });

  it('saves an engine result with its summary columns, which the list then shows', async () => {
    const eng = await t.signIn('engineer');
    const ticketed = await ticketedRun(eng, scenarioId, scenarioInput());
    const res = await eng.post(`/api/scenarios/${scenarioId}/runs`).send(ticketed.body);
    expect(res.status).toBe(201);
    const row = await t.db('runs').where({ id: res.body.id }).first();
    const respirable = (ticketed.result.breathingZone as { fractions: { respirable: { twa8h_mgPerM3: number } } }).fractions.respirable;
    expect(row.respirable_twa8h_mgPerM3).toBeCloseTo(respirable.twa8h_mgPerM3, 12);
    expect(row.particles).toBe(400);
    expect(row.seed).toBe(String(ticketed.body.input.run.seed));
    expect(['clear', 'watch', 'act']).toContain(row.banner);
    const list = await (await t.signIn('viewer')).get('/api/scenarios');
    expect(list.body.items[0].lastRun).toMatchObject({ id: res.body.id, outOfDate: false, banner: row.banner });
    expect(await t.db('audit_log').where({ action: 'run.saved' }).first()).toBeTruthy();
    // Stored gzip-compressed as plain lists (null for NaN), so it reads back to the posted result.
    expect(row.result).toBe('');
    expect(row.result_gz.length).toBeLessThan(JSON.stringify(ticketed.result).length / 3);
    const stored = unpackResult(row) as { trajectories: { positions_m: unknown } };
    expect(Array.isArray(stored.trajectories.positions_m)).toBe(true);
    expect(parseRunResult(stored)).toEqual(parseRunResult(ticketed.result));
    // The audit entry says which batches the server replayed before storing it.
    const audit = await t.db('audit_log').where({ action: 'run.saved' }).orderBy('id', 'desc').first();
    expect(JSON.parse(audit.detail).replayedBatches).toHaveLength(2);
  });

  it('lets a viewer open a saved run without re-running, and marks it out of date after an edit', async () => {
    const viewer = await t.signIn('viewer');
    const runId = (await t.db('runs').first()).id;
    const before = await viewer.get(`/api/runs/${runId}`);
    expect(before.status).toBe(200);
    expect(before.body.outOfDate).toBe(false);
    // The whole stored series comes back (sparse 400-particle runs merge time bins, so its length varies).
    const storedRow = await t.db('runs').where({ id: runId }).first();
    const storedSeries = (unpackResult(storedRow) as { breathingZone: { series: { time_s: number[] } } }).breathingZone.series.time_s;
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

describe('POST /api/scenarios/:id/run-tickets', () => {
  it('answers 401 to anonymous callers, 403 to viewers, 400 to a caller naming its own seed and 404 for no scenario', async () => {
    expect((await t.anonymous().post(`/api/scenarios/${scenarioId}/run-tickets`).send({})).status).toBe(401);
    expect((await (await t.signIn('viewer')).post(`/api/scenarios/${scenarioId}/run-tickets`).send({})).status).toBe(403);
    const eng = await t.signIn('engineer');
    const chosen = await eng.post(`/api/scenarios/${scenarioId}/run-tickets`).send({ seed: 1 });
    expect(chosen.status).toBe(400);
    expect(chosen.body.issues[0].path).toBe('body');
    expect((await eng.post('/api/scenarios/999999/run-tickets').send({})).status).toBe(404);
  });

  it('issues a fresh seed with a single-use ticket and the engine version, and stores it unused', async () => {
    const eng = await t.signIn('engineer');
    const a = await eng.post(`/api/scenarios/${scenarioId}/run-tickets`).send({});
    const b = await eng.post(`/api/scenarios/${scenarioId}/run-tickets`).send({});
    expect(a.status).toBe(201);
    expect(a.body).toEqual({ ticket: expect.stringMatching(/^[0-9a-f]{32}$/), seed: expect.any(Number), engineVersion: ENGINE_VERSION });
    expect(b.body.ticket).not.toBe(a.body.ticket);
    expect(b.body.seed).not.toBe(a.body.seed);
    const row = await t.db('run_tickets').where({ ticket: a.body.ticket }).first();
    expect(row).toMatchObject({ scenario_id: scenarioId, seed: String(a.body.seed), used_at: null, run_id: null });
  });
});

describe('what the server refuses to store', () => {
  const runCount = async () => (await t.db('runs').count({ n: '*' }))[0].n;
  const post = async (body: object) => (await t.signIn('engineer')).post(`/api/scenarios/${scenarioId}/runs`).send(body);

  it('refuses a seed the server did not issue: an unknown ticket, or a ticket with a seed other than its own', async () => {
    const before = await runCount();
    const unknown = await post({ scenarioVersion: 1, ticket: 'f'.repeat(32), input: run.scenario, result: run.result });
    expect(unknown.status).toBe(400);
    expect(unknown.body.code).toBe('seed_not_issued');
    // A real ticket, but the run used the scenario's own seed 7 (a seed the client picked).
    const { body } = await ticketedRun(await t.signIn('engineer'), scenarioId, scenarioInput());
    const shopped = await post({ ...body, input: run.scenario, result: run.result });
    expect(shopped.status).toBe(400);
    expect(shopped.body.message).toMatch(/seed was not issued/);
    expect(await runCount()).toBe(before);
  });

  it('refuses a ticket used twice', async () => {
    const { body } = await ticketedRun(await t.signIn('engineer'), scenarioId, scenarioInput());
    expect((await post(body)).status).toBe(201);
    const again = await post(body);
    expect(again.status).toBe(409);
    expect(again.body.code).toBe('ticket_used');
  });

  it('refuses a run from another engine version with a message to reload', async () => {
    const { body } = await ticketedRun(await t.signIn('engineer'), scenarioId, scenarioInput());
    const engine = { ...(body.result.engine as object), version: '0.9.0' };
    const res = await post({ ...body, result: { ...body.result, engine } });
    expect(res.status).toBe(409);
    expect(res.body.code).toBe('engine_version');
    expect(res.body.message).toMatch(/Reload the page/);
  });

  it('refuses forged numbers that the batches do not combine to (422), and writes the mismatch to the audit trail', async () => {
    const before = await runCount();
    const { body } = await ticketedRun(await t.signIn('engineer'), scenarioId, scenarioInput());
    const result = body.result as { breathingZone: { fractions: Record<string, Record<string, unknown>> } };
    const respirable = { ...result.breathingZone.fractions.respirable, twa8h_mgPerM3: 0.0001 };
    const forged = { ...result, breathingZone: { ...result.breathingZone, fractions: { ...result.breathingZone.fractions, respirable } } };
    const res = await post({ ...body, result: forged });
    expect(res.status).toBe(422);
    expect(res.body.code).toBe('replay_mismatch');
    expect(res.body.message).toMatch(/respirable concentrations do not combine/);
    expect(await runCount()).toBe(before);
    const audit = await t.db('audit_log').where({ action: 'run.replay_mismatch' }).orderBy('id', 'desc').first();
    expect(JSON.parse(audit.detail)).toMatchObject({ stage: 'save', seed: String(body.input.run.seed) });
  });

  it('refuses a self-consistent forgery (the run of a source ten times weaker, uploaded as this scenario) on replay', async () => {
    const eng = await t.signIn('engineer');
    const { body } = await ticketedRun(eng, scenarioId, scenarioInput());
    // Same seed and particle paths, a tenth of the mass: every batch figure and the result agree with one another.
    const weaker = scenarioInput();
    weaker.source.emission = { kind: 'continuous', rate_mgPerMin: 0.5, taskDuration_min: 10 };
    const forged = runEngine({ ...weaker, run: { ...weaker.run, seed: body.input.run.seed } }).result as {
      batchTallies: { fateMass_mg: number[] }[];
    };
    // Fate shares are over the emitted mass: scaled back up, the fates combine to the uploaded shares too.
    const batchTallies = forged.batchTallies.map((b) => ({ ...b, fateMass_mg: b.fateMass_mg.map((m) => m * 10) }));
    const res = await post({ ...body, result: { ...forged, batchTallies } });
    expect(res.status).toBe(422);
    expect(res.body.message).toMatch(/batch \d+: its tallies hash to/);
    const audit = await t.db('audit_log').where({ action: 'run.replay_mismatch' }).orderBy('id', 'desc').first();
    const detail = JSON.parse(audit.detail);
    expect(detail.replayedBatches).toHaveLength(2);
    expect(detail.problems.length).toBeGreaterThanOrEqual(1);
    const ticket = await t.db('run_tickets').where({ ticket: body.ticket }).first();
    expect(ticket.used_at).not.toBeNull();
    expect(ticket.run_id).toBeNull();
  });

  it('refuses a result over 1 MB compressed (413) with a message, storing nothing', async () => {
    const before = await runCount();
    const { body } = await ticketedRun(await t.signIn('engineer'), scenarioId, scenarioInput());
    // 500 paths × 300 frames of incompressible positions: about 3 MB of JSON.
    let x = 12345;
    const positions_m = Array.from({ length: 500 * 300 * 3 }, () => {
      x = (x * 1103515245 + 12345) % 2147483648;
      return Math.round(x / 2147) / 1000;
    });
    const trajectories = { particles: 500, frames: 300, frameInterval_s: 1, positions_m, bins: Array(500).fill(0) };
    const res = await post({ ...body, result: { ...body.result, trajectories } });
    expect(res.status).toBe(413);
    expect(res.body.code).toBe('result_too_large');
    expect(res.body.message).toMatch(/1 MB/);
    expect(await runCount()).toBe(before);
  });

  it('stores a run through the panel’s path (ticket, engine, save) and links the ticket to it', async () => {
    const res = await saveTicketedRun(await t.signIn('engineer'), scenarioId, scenarioInput());
    expect(res.status).toBe(201);
    expect(await t.db('run_tickets').where({ run_id: res.body.id }).first()).toBeTruthy();
  });
});

describe('approval replays the whole run', () => {
  it('refuses to approve a stored run whose unsampled batch tallies were altered (422), with an audit entry', async () => {
    const eng = await t.signIn('engineer');
    // The scenario as it stands now (an earlier test changed its hood), so the run is not out of date.
    const detail = (await eng.get(`/api/scenarios/${scenarioId}`)).body;
    const saved = await saveTicketedRun(eng, scenarioId, detail.input, detail.version);
    expect(saved.status).toBe(201);
    // As if a forged batch had slipped past the save's sample: every batch's hash altered in the stored copy.
    const row = await t.db('runs').where({ id: saved.body.id }).first();
    const stored = unpackResult(row) as { batchTallies: { hash: string }[] };
    stored.batchTallies = stored.batchTallies.map((b) => ({ ...b, hash: '0123456789abcdef' }));
    await t
      .db('runs')
      .where({ id: saved.body.id })
      .update({ result_gz: packResult(stored) });
    const res = await eng.post(`/api/scenarios/${scenarioId}/approve`).send({ runId: saved.body.id, note: 'checked' });
    expect(res.status).toBe(422);
    expect(res.body.code).toBe('replay_mismatch');
    const audit = await t.db('audit_log').where({ action: 'run.replay_mismatch' }).orderBy('id', 'desc').first();
    expect(JSON.parse(audit.detail)).toMatchObject({ stage: 'approval', runId: saved.body.id, replayedBatches: [0, 1, 2, 3] });
    expect(await t.db('approvals').count({ n: '*' })).toEqual([{ n: 0 }]);
  });

  it('approves an untouched run after replaying all its batches', async () => {
    const eng = await t.signIn('engineer');
    // The scenario as it stands now (an earlier test changed its hood), so the run is not out of date.
    const detail = (await eng.get(`/api/scenarios/${scenarioId}`)).body;
    const saved = await saveTicketedRun(eng, scenarioId, detail.input, detail.version);
    const res = await eng.post(`/api/scenarios/${scenarioId}/approve`).send({ runId: saved.body.id, note: 'checked' });
    // The full replay agrees, so only the verdict rules decide: an Act run is refused as above the limit, any other approved.
    const banner = saved.body.result.limit.banner;
    expect(res.status).toBe(banner === 'act' ? 409 : 201);
    if (res.status === 409) expect(res.body.code).toBe('above_limit');
    else expect(await t.db('approvals').where({ run_id: saved.body.id }).first()).toBeTruthy();
  });
});
