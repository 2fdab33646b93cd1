import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../helpers/test-app';
import { AGENT } from '../fixtures/workspace';

let t: TestApp;
let agentId: number;

beforeAll(async () => {
  t = await createTestApp();
  agentId = (await (await t.signIn('engineer')).post('/api/agents').send(AGENT)).body.id;
});
afterAll(() => t.close());

const stored = async () => {
  const row = await t.db('dust_agents').where({ id: agentId }).first();
  return { version: row.version as number, data: JSON.parse(row.data) };
};
// The fixture's limit is invented for the test; the override is a site's stricter figure, also invented.
const override = { limit8h_mgPerM3: 0.0125, reason: 'Site halves the limit' };

describe('editing a dust agent names the version it was made from', () => {
  it('starts a new agent at version 1', async () => {
    expect(await stored()).toMatchObject({ version: 1 });
  });

  it('answers 401 to anonymous callers, 403 to viewers, and 400 without a version, changing nothing', async () => {
    expect(
      (
        await t
          .anonymous()
          .put(`/api/agents/${agentId}`)
          .send({ version: 1, ...AGENT })
      ).status,
    ).toBe(401);
    expect((await (await t.signIn('viewer')).put(`/api/agents/${agentId}`).send({ version: 1, ...AGENT })).status).toBe(403);
    const res = await (await t.signIn('engineer')).put(`/api/agents/${agentId}`).send(AGENT);
    expect(res.status).toBe(400);
    expect(res.body.issues).toContainEqual({ path: 'body.version', message: 'Send the version you edited' });
    expect(await stored()).toMatchObject({ version: 1, data: { override: null } });
  });

  it('saves an override at the current version and moves the agent on to the next', async () => {
    const eng = await t.signIn('engineer');
    const res = await eng.put(`/api/agents/${agentId}`).send({ version: 1, name: AGENT.name, data: { ...AGENT.data, override } });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ version: 2, data: { override } });
    expect(await stored()).toMatchObject({ version: 2, data: { override } });
    const audit = await t
      .db('audit_log')
      .where({ action: 'agent.limit_overridden', target_id: String(agentId) })
      .first();
    expect(JSON.parse(audit.detail)).toMatchObject({
      version: 2,
      changes: expect.arrayContaining([{ field: 'data.override.limit8h_mgPerM3', from: null, to: 0.0125 }]),
    });
  });

  it('refuses a stale save with 409 and the current record, and does not put the old limit back', async () => {
    const eng = await t.signIn('engineer');
    // A second tab opened before the override and still shows the published limit with no override.
    const stale = await eng
      .put(`/api/agents/${agentId}`)
      .send({ version: 1, name: AGENT.name, data: { ...AGENT.data, notes: 'typo fixed' } });
    expect(stale.status).toBe(409);
    expect(stale.body.code).toBe('version_conflict');
    expect(stale.body.message).toMatch(/your version 1, current 2/);
    expect(stale.body.current).toMatchObject({ id: agentId, version: 2, data: { override } });
    expect(await stored()).toMatchObject({ version: 2, data: { override, notes: '' } });
    expect(
      await t
        .db('audit_log')
        .where({ action: 'agent.changed', target_id: String(agentId) })
        .first(),
    ).toBeUndefined();
  });

  it('refuses a stale removal of the override the same way', async () => {
    const eng = await t.signIn('engineer');
    const stale = await eng.put(`/api/agents/${agentId}`).send({ version: 1, name: AGENT.name, data: { ...AGENT.data, override: null } });
    expect(stale.status).toBe(409);
    expect((await stored()).data.override).toEqual(override);
  });

  it('answers 404 for an agent that does not exist', async () => {
    const res = await (await t.signIn('engineer')).put('/api/agents/9999').send({ version: 1, ...AGENT });
    expect(res.status).toBe(404);
  });
});
