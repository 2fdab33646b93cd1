import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createDb, migrateLatest, type Db } from '../../server/db/knex';
import { migrationSource } from '../../server/db/migration-source';
import { seedDemo } from '../../server/db/seed';
import { inputHash } from '../../server/lib/hash';

const NAME = '20261202150000_move_release_type_to_source.ts';
const now = new Date().toISOString();

// A 1.x-shaped scenario: the release type sits on the hood, the room knows nothing of wall deposition.
const hood = {
  kind: 'flanged',
  x_m: 3,
  y_m: 3.3,
  z_m: 0.95,
  direction: { azimuth_deg: -90, elevation_deg: 0 },
  faceWidth_m: 0.35,
  faceHeight_m: 0.25,
  airflow_m3PerS: 0.35,
};
const oldInput = (hoods: object[]) => ({
  room: { length_m: 8, width_m: 6, height_m: 3.5, airChanges_perH: 3 },
  source: { x_m: 3, y_m: 3, z_m: 0.92, emission: { kind: 'continuous', rate_mgPerMin: 20, taskDuration_min: 60 } },
  dust: { density_kgPerM3: 2650, sizeProfile: { kind: 'lognormal', basis: 'mmad', median_m: 1e-5, gsd: 2.5 } },
  hoods,
  worker: { x_m: 3, y_m: 2.35, z_m: 1.5 },
});
const hooded = oldInput([{ ...hood, releaseType: 'high' }]);
const bare = oldInput([]);

let db: Db;
const ids: Record<string, number> = {};
const read = async (table: string, id: number) => {
  const row = await db(table).where({ id }).first();
  return { input: JSON.parse(row.input), hash: row.input_hash as string };
};

beforeAll(async () => {
  db = createDb(':memory:');
  await migrateLatest(db);
  await db.migrate.down({ migrationSource, name: NAME });
  await seedDemo(db, { workspace: false });
  const person = (await db('people').first()).id;
  const stamp = { created_by: person, created_at: now, updated_at: now };
  const [site] = await db('sites')
    .insert({ name: 'S', data: '{}', ...stamp })
    .returning('id');
  const [room] = await db('rooms')
    .insert({ site_id: site.id, name: 'R', data: '{}', ...stamp })
    .returning('id');
  const [ws] = await db('workstations')
    .insert({ room_id: room.id, name: 'W', data: JSON.stringify({ releaseType: 'active' }), ...stamp })
    .returning('id');
  for (const [key, input] of [
    ['hooded', hooded],
    ['bare', bare],
  ] as const) {
    const [s] = await db('scenarios')
      .insert({ workstation_id: ws.id, name: key, input: JSON.stringify(input), input_hash: inputHash(input), ...stamp })
      .returning('id');
    const [r] = await db('runs')
      .insert({
        scenario_id: s.id,
        seed: '1',
        engine_version: '1.3.0',
        input_hash: inputHash(input),
        particles: 10,
        input: JSON.stringify(input),
        result: '{}',
        created_by: person,
        created_at: now,
      })
      .returning('id');
    ids[key] = s.id;
    ids[`${key}Run`] = r.id;
  }
});
afterAll(() => db.destroy());

describe('moving the release type to the source', () => {
  it("gives the source its hood's release type, drops it from the hood, and keeps the run current", async () => {
    await db.migrate.up({ migrationSource, name: NAME });
    const scenario = await read('scenarios', ids.hooded);
    expect(scenario.input.source.releaseType).toBe('high');
    expect(scenario.input.hoods[0]).toEqual(hood);
    expect(scenario.input.room.wallDeposition).toBe(true);
    expect(scenario.hash).toBe(inputHash(scenario.input));
    const run = await read('runs', ids.hoodedRun);
    expect(run.input).toEqual(scenario.input);
    expect(run.hash).toBe(scenario.hash);
  });

  it("falls back to the workstation's release type when no hood carries one", async () => {
    expect((await read('scenarios', ids.bare)).input.source.releaseType).toBe('active');
    expect((await read('runs', ids.bareRun)).input.source.releaseType).toBe('active');
  });

  it('puts the release type back on the hoods when rolled back', async () => {
    await db.migrate.down({ migrationSource, name: NAME });
    const scenario = await read('scenarios', ids.hooded);
    expect(scenario.input).toEqual(hooded);
    expect(scenario.hash).toBe(inputHash(hooded));
    expect((await read('runs', ids.hoodedRun)).hash).toBe(scenario.hash);
    expect((await read('scenarios', ids.bare)).input).toEqual(bare);
  });
});
