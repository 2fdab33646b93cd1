import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('scenarios', (t) => {
    t.increments('id').primary();
    t.integer('workstation_id').notNullable().references('id').inTable('workstations');
    t.integer('agent_id').nullable().references('id').inTable('dust_agents');
    t.integer('size_profile_id').nullable();
    t.string('name', 120).notNullable();
    t.string('control_description', 500).notNullable().defaultTo('');
    t.string('control_tier', 20).notNullable().defaultTo('none');
    t.string('status', 20).notNullable().defaultTo('draft');
    t.integer('version').notNullable().defaultTo(1);
    t.text('input').notNullable();
    t.string('input_hash', 64).notNullable();
    t.integer('created_by').nullable().references('id').inTable('people');
    t.integer('updated_by').nullable().references('id').inTable('people');
    t.string('created_at').notNullable();
    t.string('updated_at').notNullable();
    t.string('deleted_at').nullable();
  });
  await knex.schema.createTable('runs', (t) => {
    t.increments('id').primary();
    t.integer('scenario_id').notNullable().references('id').inTable('scenarios');
    t.string('seed', 60).notNullable();
    t.string('engine_version', 40).notNullable();
    t.string('input_hash', 64).notNullable();
    t.integer('particles').notNullable();
    t.string('limit_fraction', 20).nullable();
    t.float('twa8h_mgPerM3').nullable();
    t.float('twa8h_lo_mgPerM3').nullable();
    t.float('twa8h_hi_mgPerM3').nullable();
    t.float('respirable_twa8h_mgPerM3').nullable();
    t.float('percent_of_limit').nullable();
    t.integer('rating_category').nullable();
    t.string('banner', 10).nullable();
    t.text('input').notNullable();
    t.text('result').notNullable();
    t.integer('created_by').nullable().references('id').inTable('people');
    t.string('created_at').notNullable();
    t.string('deleted_at').nullable();
    t.index(['scenario_id', 'created_at']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('runs');
  await knex.schema.dropTable('scenarios');
}
