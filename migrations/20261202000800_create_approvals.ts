import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('approvals', (t) => {
    t.increments('id').primary();
    t.integer('workstation_id').notNullable().references('id').inTable('workstations');
    t.integer('scenario_id').notNullable().references('id').inTable('scenarios');
    t.integer('run_id').notNullable().references('id').inTable('runs');
    t.string('note', 1000).notNullable().defaultTo('');
    t.string('review_date', 10).notNullable();
    t.integer('approved_by').notNullable().references('id').inTable('people');
    t.string('approved_at').notNullable();
    t.string('superseded_at').nullable();
    t.index(['workstation_id', 'superseded_at']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('approvals');
}
