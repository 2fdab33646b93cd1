import fc from 'fast-check';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../helpers/test-app';
import { saveTicketedRun } from '../helpers/run-engine';
import { AGENT, ROOM_DATA, SITE, WORKSTATION_DATA, scenarioInput } from '../fixtures/workspace';

let t: TestApp;
let admin: Awaited<ReturnType<TestApp['signIn']>>;
const ids = { scenario: 0, site: 0, room: 0, workstation: 0, agent: 0, person: 0, run: 0 };
let sent = 0;

beforeAll(async () => {
  t = await createTestApp();
  admin = await t.signIn('admin');
  const site = await admin.post('/api/sites').send(SITE);
  const room = await admin.post('/api/rooms').send({ siteId: site.body.id, name: 'Hall', data: ROOM_DATA });
  ids.site = site.body.id;
  ids.room = room.body.id;
  ids.workstation = (await admin.post('/api/workstations').send({ roomId: room.body.id, name: 'Bench', data: WORKSTATION_DATA })).body.id;
  ids.agent = (await admin.post('/api/agents').send(AGENT)).body.id;
  const input = scenarioInput({ run: { particles: 200, seed: 1, batches: 2 } });
  ids.scenario = (
    await admin.post('/api/scenarios').send({ workstationId: ids.workstation, agentId: ids.agent, name: 'Fuzz target', input })
  ).body.id;
  ids.run = (await saveTicketedRun(admin, ids.scenario, input)).body.id;
  ids.person = await t.personId('viewer');
  // The run is replayed on worker threads before it is stored; their first start is slow on a busy machine.
}, 60_000);
afterAll(async () => {
  console.log(`fuzz: ${sent} hostile requests sent`);
  await t.close();
});

// Every table but sessions (rolling cookies touch it on each request): what a refused write must not change.
async function snapshot(): Promise<string> {
  const tables = (await t.db.raw(
    "select name from sqlite_master where type = 'table' and name not like 'sqlite_%' and name not in ('sessions', 'knex_migrations_lock') order by name",
  )) as { name: string }[];
  const parts: string[] = [];
  for (const { name } of tables) parts.push(name, JSON.stringify(await t.db(name).select('*').orderByRaw('rowid')));
  return parts.join('\n');
}

const HOSTILE_STRINGS = [
  "'; DROP TABLE people; --",
  '<script>alert(1)</script>',
  '<img src=x onerror=alert(1)>',
  '\u0000\u0001',
  '\u202e\uFEFF𝔘𝔫𝔦☃',
  '../../etc/passwd',
  '{{7*7}}',
  '%s%n',
  'x'.repeat(20_000),
];
const hostileLeaf = fc.oneof(
  fc.constantFrom(...HOSTILE_STRINGS),
  fc.string({ unit: 'grapheme', maxLength: 40 }),
  fc.double(),
  fc.constantFrom(-1, 0, -0, 1e308, -1e308, 2 ** 53 + 1, 5e-324, -999999999),
  fc.boolean(),
  fc.constant(null),
);
const hostileValue = fc.letrec((tie) => ({
  value: fc.oneof(
    { depthSize: 'small' },
    hostileLeaf,
    fc.array(tie('value'), { maxLength: 4 }),
    fc.dictionary(fc.string({ maxLength: 12 }), tie('value'), { maxKeys: 4 }),
  ),
})).value;
const nested = (depth: number) => JSON.parse('['.repeat(depth) + ']'.repeat(depth));

// Raw bodies that are not JSON a browser would send: NaN, Infinity, prototype keys, deep nesting.
const RAW = [
  '{"name": NaN}',
  '{"x": Infinity}',
  '{"__proto__": {"role": "admin"}}',
  '{"constructor": {"prototype": {"role": "admin"}}}',
  '{"a":',
  '[]',
  '"text"',
  '{"input": ' + '['.repeat(5000) + ']'.repeat(5000) + '}',
  // One level past the parser's depth limit, and deep nesting hidden behind brackets inside a string.
  '['.repeat(65) + ']'.repeat(65),
  '{"name": "' + '['.repeat(100) + '", "x": ' + '{"a":'.repeat(70) + '1' + '}'.repeat(70) + '}',
];

function bodyFor(validShape: Record<string, unknown>) {
  const keys = Object.keys(validShape);
  return fc.oneof(
    hostileValue,
    fc.constant(nested(2000)),
    // A valid body with one field replaced: the commonest real mistake.
    fc.tuple(fc.constantFrom(...keys), hostileValue).map(([k, v]) => ({ ...validShape, [k]: v })),
    fc.dictionary(fc.constantFrom(...keys, '__proto__', 'constructor', 'isAdmin', 'version'), hostileValue, { maxKeys: 5 }),
  );
}

type Target = { method: 'post' | 'put' | 'patch'; url: () => string; valid: Record<string, unknown> };
const TARGETS: Target[] = [
  { method: 'post', url: () => '/api/people', valid: { email: 'a@b.org', name: 'A', role: 'viewer' } },
  { method: 'patch', url: () => `/api/people/${ids.person}`, valid: { role: 'viewer' } },
  { method: 'post', url: () => '/api/auth/set-password', valid: { token: 'x'.repeat(30), password: 'long-enough-pass' } },
  { method: 'post', url: () => '/api/sites', valid: SITE },
  { method: 'post', url: () => '/api/rooms', valid: { siteId: 1, name: 'R', data: ROOM_DATA } },
  { method: 'post', url: () => '/api/workstations', valid: { roomId: 1, name: 'W', data: WORKSTATION_DATA } },
  { method: 'put', url: () => `/api/workstations/${ids.workstation}`, valid: { version: 1, name: 'W', data: WORKSTATION_DATA } },
  { method: 'put', url: () => `/api/sites/${ids.site}`, valid: { version: 1, ...SITE } },
  { method: 'put', url: () => `/api/rooms/${ids.room}`, valid: { version: 1, name: 'R', data: ROOM_DATA } },
  { method: 'put', url: () => `/api/workstations/${ids.workstation}/operators`, valid: { personIds: [] } },
  { method: 'post', url: () => '/api/agents', valid: AGENT },
  { method: 'put', url: () => `/api/agents/${ids.agent}`, valid: { version: 1, ...AGENT } },
  { method: 'post', url: () => '/api/scenarios', valid: { workstationId: 1, name: 'S', input: scenarioInput() } },
  { method: 'patch', url: () => `/api/scenarios/${ids.scenario}`, valid: { version: 1, name: 'S' } },
  { method: 'post', url: () => `/api/scenarios/${ids.scenario}/duplicate`, valid: { name: 'copy' } },
  // A caller may not pick its own seed: the only field it could try is refused.
  { method: 'post', url: () => `/api/scenarios/${ids.scenario}/run-tickets`, valid: { seed: 1 } },
  {
    method: 'post',
    url: () => `/api/scenarios/${ids.scenario}/runs`,
    valid: { scenarioVersion: 1, ticket: '0'.repeat(32), input: scenarioInput(), result: {} },
  },
  { method: 'post', url: () => `/api/scenarios/${ids.scenario}/approve`, valid: { runId: 1, note: '' } },
  { method: 'post', url: () => `/api/scenarios/${ids.scenario}/share`, valid: { email: 'a@b.org' } },
  { method: 'post', url: () => '/api/size-profiles', valid: { kind: 'lognormal', name: 'P', basis: 'mmad', median_m: 5e-6, gsd: 2 } },
];

async function expectRefusedCleanly(
  send: () => Promise<{ status: number; body: Record<string, unknown>; headers: Record<string, string> }>,
) {
  const before = await snapshot();
  const res = await send();
  sent += 1;
  expect(res.status, JSON.stringify(res.body).slice(0, 200)).toBeLessThan(500);
  expect(res.headers['cache-control']).toBe('no-store');
  if (res.status >= 400) {
    expect(typeof res.body.code).toBe('string');
    expect(typeof res.body.message).toBe('string');
    expect(await snapshot()).toBe(before);
  }
}

describe('hostile payloads to every write endpoint', () => {
  for (const target of TARGETS) {
    it(`refuses bad bodies to ${target.method.toUpperCase()} ${target.url().replace(/\d+/g, ':id')} with a 4xx and no change`, async () => {
      await fc.assert(
        fc.asyncProperty(bodyFor(target.valid), async (body) => {
          await expectRefusedCleanly(() =>
            admin[target.method](target.url())
              .set('Content-Type', 'application/json')
              .send(JSON.stringify(body) ?? 'null'),
          );
        }),
        { numRuns: 60 },
      );
      for (const raw of RAW)
        await expectRefusedCleanly(() => admin[target.method](target.url()).set('Content-Type', 'application/json').send(raw));
    });
  }

  it('refuses hostile ids in the path', async () => {
    await fc.assert(
      fc.asyncProperty(fc.constantFrom(...HOSTILE_STRINGS.slice(0, 8), '-1', '0', '1e9999', '9'.repeat(400), 'NaN'), async (id) => {
        await expectRefusedCleanly(() => admin.patch(`/api/scenarios/${encodeURIComponent(id)}`).send({ version: 1 }));
      }),
      { numRuns: 30 },
    );
  });

  it('refuses hostile uploads: malformed CSV, binary, oversize and wrong extension', async () => {
    const file = fc.oneof(
      fc.uint8Array({ minLength: 1, maxLength: 2000 }).map((b) => ({ bytes: Buffer.from(b), name: 'stages.csv' })),
      fc.string({ maxLength: 300 }).map((s) => ({ bytes: Buffer.from(`cut_point_um,mass_mg\n${s}`), name: 'stages.csv' })),
      fc
        .constantFrom('a,b\n"unclosed', 'cut_point_um,mass_mg\n-5,1\n', ',,,\n,,,', '')
        .map((s) => ({ bytes: Buffer.from(s), name: 'stages.csv' })),
      fc.constant({ bytes: Buffer.from('cut_point_um,mass_mg\n10,1\n,1\n'), name: 'stages.exe' }),
      fc.constant({ bytes: Buffer.alloc(300 * 1024, 0x31), name: 'big.csv' }),
    );
    await fc.assert(
      fc.asyncProperty(file, fc.constantFrom('impactor', 'counter', 'bins', 'bogus'), async (f, format) => {
        await expectRefusedCleanly(() =>
          admin.post('/api/size-profiles/upload').field('format', format).field('name', 'fuzz').attach('file', f.bytes, f.name),
        );
      }),
      { numRuns: 80 },
    );
  });

  it('has sent at least 1,000 hostile requests and the app still answers', async () => {
    expect(sent).toBeGreaterThanOrEqual(1000);
    expect((await admin.get('/api/health')).status).toBe(200);
  });
});
