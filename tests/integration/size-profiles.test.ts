import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../helpers/test-app';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

const IMPACTOR = 'cut_point_um,mass_mg\n10,1\n5,2\n2,3\n,4\n';
const COUNTER = 'lower_um,upper_um,count\n0.5,1,8000\n1,2,1000\n2,4,125\n';
const BINS = 'lower_um,upper_um,mass_fraction\n1,2,0.2\n2,4,0.5\n4,8,0.3\n';
const LOGNORMAL = { kind: 'lognormal', name: 'Grinding dust', basis: 'mmad', median_m: 5e-6, gsd: 2 };

// Sign-ins write audit rows too; only our own actions count here.
const count = async (table: 'size_profiles' | 'audit_log') =>
  Number((await (table === 'audit_log' ? t.db(table).where('action', 'like', 'size_profile.%') : t.db(table)).count({ n: '*' }))[0].n);

async function upload(role: 'engineer' | 'admin', csv: string | Buffer, fileName: string, fields: Record<string, string>) {
  const agent = await t.signIn(role);
  let req = agent.post('/api/size-profiles/upload');
  for (const [k, v] of Object.entries(fields)) req = req.field(k, v);
  return req.attach('file', Buffer.isBuffer(csv) ? csv : Buffer.from(csv), fileName);
}

describe('size-profile endpoints refuse the wrong people', () => {
  const reads = [
    ['get', '/api/size-profiles'],
    ['get', '/api/size-profiles/1'],
    ['get', '/api/size-profiles/templates/impactor.csv'],
  ] as const;
  const writes = [
    ['post', '/api/size-profiles'],
    ['post', '/api/size-profiles/upload'],
    ['delete', '/api/size-profiles/1'],
  ] as const;

  it.each([...reads, ...writes])('answers 401 to anonymous %s %s', async (method, url) => {
    const res = await t.anonymous()[method](url);
    expect(res.status).toBe(401);
    expect(res.body.code).toBe('unauthenticated');
  });

  it.each([...reads, ...writes])('answers 403 to an operator on %s %s', async (method, url) => {
    const res = await (await t.signIn('operator'))[method](url);
    expect(res.status).toBe(403);
  });

  it.each(writes)('answers 403 to a viewer on %s %s', async (method, url) => {
    const res = await (await t.signIn('viewer'))[method](url).send(LOGNORMAL);
    expect(res.status).toBe(403);
    expect(res.body.code).toBe('forbidden');
  });
});

describe('POST /api/size-profiles (lognormal and respirable-only forms)', () => {
  it('stores a lognormal profile with its fractions and writes the audit log', async () => {
    const before = await count('audit_log');
    const res = await (await t.signIn('engineer')).post('/api/size-profiles').send(LOGNORMAL);
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({
      kind: 'lognormal',
      fittedMmad_m: 5e-6,
      fittedGsd: 2,
      sizeProfile: { kind: 'lognormal', basis: 'mmad', median_m: 5e-6, gsd: 2 },
    });
    const row = await t.db('size_profiles').where({ id: res.body.id }).first();
    expect(row).toMatchObject({
      name: 'Grinding dust',
      kind: 'lognormal',
      fitted_gsd: 2,
      deleted_at: null,
      created_by: await t.personId('engineer'),
    });
    expect(JSON.parse(row.input)).toMatchObject({ basis: 'mmad', median_m: 5e-6 });
    expect(row.respirable_fraction).toBeGreaterThan(0.2);
    expect(await count('audit_log')).toBe(before + 1);
    const audit = await t.db('audit_log').orderBy('id', 'desc').first();
    expect(audit).toMatchObject({ action: 'size_profile.created', target_type: 'size_profile', target_id: String(res.body.id) });
  });

  it('stores a respirable fraction as given with the assumed GSD 2', async () => {
    const res = await (
      await t.signIn('admin')
    )
      .post('/api/size-profiles')
      .send({ kind: 'respirable', name: 'Sanding (respirable only)', respirableFraction: 0.35 });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ kind: 'respirable', respirableFraction: 0.35, fittedGsd: 2 });
  });

  it('answers 400 with every field path, stores nothing', async () => {
    const before = await count('size_profiles');
    const res = await (
      await t.signIn('engineer')
    )
      .post('/api/size-profiles')
      .send({ kind: 'lognormal', name: '', basis: 'cmd', median_m: -1, gsd: 0.5 });
    expect(res.status).toBe(400);
    expect(res.body.issues.map((i: { path: string }) => i.path).sort()).toEqual([
      'body.density_kgPerM3',
      'body.gsd',
      'body.median_m',
      'body.name',
    ]);
    const cmd = await (await t.signIn('engineer')).post('/api/size-profiles').send({ ...LOGNORMAL, basis: 'cmd' });
    expect(cmd.status).toBe(400);
    expect(cmd.body.issues[0].path).toBe('body.density_kgPerM3');
    expect(await count('size_profiles')).toBe(before);
  });
});

describe('POST /api/size-profiles/upload: good files', () => {
  it('stores impactor stages as aerodynamic bins with a fit and an audit row', async () => {
    const audits = await count('audit_log');
    const res = await upload('engineer', IMPACTOR, 'stages.csv', { format: 'impactor', name: 'Bench impactor' });
    expect(res.status).toBe(201);
    expect(res.body.bins.massFraction).toEqual([0.4, 0.3, 0.2, 0.1]);
    expect(res.body.sizeProfile).toMatchObject({ kind: 'bins', basis: 'mass', diameter: 'aerodynamic' });
    expect(res.body.fittedGsd).toBeGreaterThan(1);
    const row = await t.db('size_profiles').where({ id: res.body.id }).first();
    expect(row.kind).toBe('impactor');
    expect(JSON.parse(row.input)).toMatchObject({ kind: 'impactor', fileName: 'stages.csv' });
    expect(await count('audit_log')).toBe(audits + 1);
  });

  it('stores counter bins when the density is given and confirmed', async () => {
    const res = await upload('engineer', COUNTER, 'counts.CSV', {
      format: 'counter',
      name: 'Counter',
      density_kgPerM3: '2650',
      density_confirmed: 'true',
    });
    expect(res.status).toBe(201);
    expect(res.body.input).toMatchObject({ kind: 'counter', density_kgPerM3: 2650 });
    expect(res.body.bins.massFraction.every((m: number) => m > 0)).toBe(true);
  });

  it('stores plain bins, and answers 400 for a counter upload without a confirmed density', async () => {
    expect((await upload('admin', BINS, 'bins.csv', { format: 'bins', name: 'Plain' })).status).toBe(201);
    const res = await upload('engineer', COUNTER, 'counts.csv', { format: 'counter', name: 'Counter', density_kgPerM3: '2650' });
    expect(res.status).toBe(400);
    expect(res.body.issues.map((i: { path: string }) => i.path)).toEqual(['body.density_confirmed']);
  });
});

describe('POST /api/size-profiles/upload: bad files store nothing', () => {
  const bad: [string, string | Buffer, string, string, RegExp][] = [
    ['wrong columns', 'diameter,mass\n1,2\n3,4\n', 'stages.csv', 'impactor', /Unexpected column/],
    ['negative sizes', 'lower_um,upper_um,mass_fraction\n-1,2,0.5\n2,4,0.5\n', 'bins.csv', 'bins', /positive size/],
    ['an empty file', '', 'empty.csv', 'bins', /empty/],
    ['a binary file', Buffer.from([0x50, 0x4b, 0x03, 0x04, 0x00, 0x00, 0xff]), 'book.csv', 'bins', /not text/],
    ['non-UTF-8 bytes', Buffer.from([0x61, 0xff, 0xfe, 0x2c, 0x62]), 'latin.csv', 'bins', /not UTF-8/],
    ['a wrong extension', BINS, 'bins.xlsx', 'bins', /Only \.csv/],
    ['a broken quote', 'lower_um,upper_um,mass_fraction\n"1,2,0.5\n', 'q.csv', 'bins', /could not be read as CSV/],
  ];

  it.each(bad)('answers 422 for %s', async (_what, content, fileName, format, message) => {
    const [rows, audits] = [await count('size_profiles'), await count('audit_log')];
    const res = await upload('engineer', content, fileName, { format, name: 'Bad' });
    expect(res.status).toBe(422);
    expect(res.body.code).toBe('invalid_file');
    expect(res.body.issues[0]).toMatchObject({ path: 'file', message: expect.stringMatching(message) });
    expect(Object.keys(res.body.issues[0]).sort()).toEqual(['column', 'message', 'path', 'row']);
    expect([await count('size_profiles'), await count('audit_log')]).toEqual([rows, audits]);
  });

  it('reports every bad row with its row number and column', async () => {
    const res = await upload('engineer', 'cut_point_um,mass_mg\n10,1\n12,x\n2,-3\n', 'stages.csv', { format: 'impactor', name: 'Bad' });
    expect(res.status).toBe(422);
    expect(res.body.issues).toEqual([
      { path: 'file', row: 3, column: 'mass_mg', message: '"x" is not a number' },
      { path: 'file', row: 3, column: 'cut_point_um', message: 'Cut-points must decrease from the top stage down: 12 follows 10' },
      { path: 'file', row: 4, column: 'cut_point_um', message: expect.stringMatching(/backup filter/) },
      { path: 'file', row: 4, column: 'mass_mg', message: 'Must not be negative, got -3' },
    ]);
  });

  it('answers 413 in the one error shape for a file over 256 kB', async () => {
    const before = await count('size_profiles');
    const huge = BINS + '1,2,0.1\n'.repeat(40_000);
    const res = await upload('engineer', huge, 'huge.csv', { format: 'bins', name: 'Huge' });
    expect(res.status).toBe(413);
    expect(res.body).toEqual({ code: 'file_too_large', message: expect.stringMatching(/256 kB/) });
    expect(await count('size_profiles')).toBe(before);
  });

  it('answers 400 for a missing file, a missing name or an unknown format', async () => {
    const agent = await t.signIn('engineer');
    const none = await agent.post('/api/size-profiles/upload').field('format', 'bins').field('name', 'No file');
    expect(none.status).toBe(400);
    expect(none.body.issues).toEqual([{ path: 'file', message: 'No file was sent' }]);
    const fields = await upload('engineer', BINS, 'bins.csv', { format: 'spreadsheet' });
    expect(fields.status).toBe(400);
    expect(fields.body.issues.map((i: { path: string }) => i.path).sort()).toEqual(['body.format', 'body.name']);
  });
});

describe('reading, listing, templates and deleting', () => {
  it('lists live profiles, paginated and sorted by the asked column', async () => {
    const res = await (await t.signIn('viewer')).get('/api/size-profiles?sort=name&order=asc&pageSize=2');
    expect(res.status).toBe(200);
    expect(res.body.total).toBe(
      await t
        .db('size_profiles')
        .whereNull('deleted_at')
        .count({ n: '*' })
        .then((r) => Number(r[0].n)),
    );
    expect(res.body.items).toHaveLength(2);
    const names = res.body.items.map((p: { name: string }) => p.name);
    expect(names).toEqual([...names].sort());
    expect(res.body.items[0]).not.toHaveProperty('bins');
    expect((await (await t.signIn('viewer')).get('/api/size-profiles?sort=password')).status).toBe(400);
  });

  it('shows one profile with bins, fit and fractions; 404 for an unknown id and 400 for a bad one', async () => {
    const viewer = await t.signIn('viewer');
    const res = await viewer.get('/api/size-profiles/1');
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({
      id: 1,
      bins: { edges_m: expect.any(Array) },
      thoracicFraction: expect.any(Number),
      inhalableFraction: expect.any(Number),
    });
    expect((await viewer.get('/api/size-profiles/9999')).status).toBe(404);
    expect((await viewer.get('/api/size-profiles/abc')).status).toBe(400);
  });

  it('serves a CSV template for each format that uploads cleanly', async () => {
    const viewer = await t.signIn('viewer');
    for (const format of ['impactor', 'counter', 'bins']) {
      const res = await viewer.get(`/api/size-profiles/templates/${format}.csv`);
      expect(res.status).toBe(200);
      expect(res.headers['content-type']).toMatch(/text\/csv/);
      expect(res.headers['content-disposition']).toMatch(/attachment/);
      const up = await upload('engineer', res.text, `${format}.csv`, {
        format,
        name: `Template ${format}`,
        density_kgPerM3: '1500',
        density_confirmed: 'true',
      });
      expect(up.status).toBe(201);
    }
    expect((await viewer.get('/api/size-profiles/templates/excel.csv')).status).toBe(400);
  });

  it('soft-deletes with an audit row; the profile leaves the list but the row stays', async () => {
    const engineer = await t.signIn('engineer');
    const created = await engineer.post('/api/size-profiles').send({ ...LOGNORMAL, name: 'To delete' });
    const res = await engineer.delete(`/api/size-profiles/${created.body.id}`);
    expect(res.status).toBe(204);
    expect((await t.db('size_profiles').where({ id: created.body.id }).first()).deleted_at).not.toBeNull();
    expect((await engineer.get(`/api/size-profiles/${created.body.id}`)).status).toBe(404);
    expect(
      await t
        .db('audit_log')
        .where({ action: 'size_profile.deleted', target_id: String(created.body.id) })
        .first(),
    ).toBeTruthy();
    expect((await engineer.delete(`/api/size-profiles/${created.body.id}`)).status).toBe(404);
    expect((await engineer.delete('/api/size-profiles/zero')).status).toBe(400);
  });
});
