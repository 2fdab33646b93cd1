import type { Knex } from 'knex';

// The server hands out each saved run's seed once, so a browser cannot try seeds until one looks good.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('run_tickets', (t) => {
    t.increments('id').primary();
    t.string('ticket', 64).notNullable().unique();
    t.integer('scenario_id').notNullable().references('id').inTable('scenarios');
    t.string('seed', 60).notNullable();
    t.string('engine_version', 40).notNullable();
    t.integer('issued_to').notNullable().references('id').inTable('people');
    t.string('issued_at').notNullable();
    t.string('used_at').nullable();
    t.integer('run_id').nullable().references('id').inTable('runs');
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('run_tickets');
}
