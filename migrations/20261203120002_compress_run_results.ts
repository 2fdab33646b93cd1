import { gunzipSync, gzipSync } from 'node:zlib';
import type { Knex } from 'knex';

// Results are stored gzip-compressed (a run's JSON shrinks about five-fold); the text column stays
// for older rows until this has run and is left empty afterwards.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('runs', (t) => {
    t.binary('result_gz').nullable();
  });
  const runs = await knex('runs').select('id', 'result');
  for (const run of runs)
    await knex('runs')
      .where({ id: run.id })
      .update({ result_gz: gzipSync(run.result as string), result: '' });
}

export async function down(knex: Knex): Promise<void> {
  const runs = await knex('runs').whereNotNull('result_gz').select('id', 'result_gz');
  for (const run of runs)
    await knex('runs')
      .where({ id: run.id })
      .update({ result: gunzipSync(run.result_gz as Buffer).toString('utf8') });
  await knex.schema.alterTable('runs', (t) => {
    t.dropColumn('result_gz');
  });
}
