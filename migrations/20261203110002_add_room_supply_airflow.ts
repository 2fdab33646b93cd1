import type { Knex } from 'knex';

type Json = Record<string, unknown>;

// Rooms so far held air changes only: they were entered that way, and their supply airflow follows from the
// volume. The arithmetic is written out here rather than imported so this migration keeps doing what it did.
export async function up(knex: Knex): Promise<void> {
  await knex.transaction(async (trx) => {
    for (const row of (await trx('rooms').select('id', 'data')) as { id: number; data: string }[]) {
      const d = JSON.parse(row.data) as Json;
      const volume_m3 = Number(d.length_m) * Number(d.width_m) * Number(d.height_m);
      const supplyAirflow_m3PerH = Number(d.airChanges_perH) * volume_m3;
      await trx('rooms')
        .where({ id: row.id })
        .update({ data: JSON.stringify({ ...d, ventilationEntered: 'airChanges', supplyAirflow_m3PerH }) });
    }
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.transaction(async (trx) => {
    for (const row of (await trx('rooms').select('id', 'data')) as { id: number; data: string }[]) {
      const { ventilationEntered: _entered, supplyAirflow_m3PerH: _supply, ...rest } = JSON.parse(row.data) as Json;
      await trx('rooms')
        .where({ id: row.id })
        .update({ data: JSON.stringify(rest) });
    }
  });
}
