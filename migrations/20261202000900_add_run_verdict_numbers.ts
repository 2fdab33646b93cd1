import type { Knex } from 'knex';

type Stored = {
  engine: { particles: number };
  breathingZone: { fractions: Record<string, { twa8h_mgPerM3: number; twa8hCi95_mgPerM3: number[]; zoneHistories?: number }> };
};

// A frozen copy of server/verdicts/verdict-numbers.ts as it was: a migration must not change with the code.
function numbersOf(result: Stored) {
  const fractions = Object.fromEntries(
    Object.entries(result.breathingZone.fractions).map(([f, s]) => [
      f,
      {
        twa8h_mgPerM3: s.twa8h_mgPerM3,
        twa8hCi95_mgPerM3: s.twa8hCi95_mgPerM3.slice(0, 2),
        ...(typeof s.zoneHistories === 'number' ? { zoneHistories: s.zoneHistories } : {}),
      },
    ]),
  );
  return { histories: result.engine.particles, fractions };
}

// The server judges every read from these numbers and the agent's current limit; the approval keeps
// the limit it was given under, so a later change shows as "limit changed since approval".
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('runs', (t) => {
    t.text('verdict_numbers').nullable();
  });
  await knex.schema.alterTable('approvals', (t) => {
    t.string('limit_fraction', 20).nullable();
    t.float('limit_mgPerM3').nullable();
  });
  const runs = await knex('runs').select('id', 'result');
  for (const run of runs) {
    await knex('runs')
      .where({ id: run.id })
      .update({ verdict_numbers: JSON.stringify(numbersOf(JSON.parse(run.result) as Stored)) });
  }
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('approvals', (t) => {
    t.dropColumn('limit_mgPerM3');
    t.dropColumn('limit_fraction');
  });
  await knex.schema.alterTable('runs', (t) => {
    t.dropColumn('verdict_numbers');
  });
}
