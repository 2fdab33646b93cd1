import type { Knex } from 'knex';

const TABLES = ['sites', 'rooms', 'workstations', 'dust_agents'] as const;

// Every edit names the version it started from, as scenarios already do; existing rows start at 1.
export async function up(knex: Knex): Promise<void> {
  for (const table of TABLES)
    await knex.schema.alterTable(table, (t) => {
      t.integer('version').notNullable().defaultTo(1);
    });
}

export async function down(knex: Knex): Promise<void> {
  for (const table of TABLES)
    await knex.schema.alterTable(table, (t) => {
      t.dropColumn('version');
    });
}
