import type { Knex } from 'knex';

const stamps = (t: Knex.CreateTableBuilder) => {
  t.integer('created_by').nullable().references('id').inTable('people');
  t.string('created_at').notNullable();
  t.string('updated_at').notNullable();
  t.string('deleted_at').nullable();
};

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('sites', (t) => {
    t.increments('id').primary();
    t.string('name', 120).notNullable();
    t.text('data').notNullable();
    stamps(t);
  });
  await knex.schema.createTable('rooms', (t) => {
    t.increments('id').primary();
    t.integer('site_id').notNullable().references('id').inTable('sites');
    t.string('name', 120).notNullable();
    t.text('data').notNullable();
    stamps(t);
  });
  await knex.schema.createTable('workstations', (t) => {
    t.increments('id').primary();
    t.integer('room_id').notNullable().references('id').inTable('rooms');
    t.string('name', 120).notNullable();
    t.text('data').notNullable();
    stamps(t);
  });
  await knex.schema.createTable('dust_agents', (t) => {
    t.increments('id').primary();
    t.string('name', 120).notNullable();
    t.text('data').notNullable();
    stamps(t);
  });
  await knex.schema.createTable('workstation_operators', (t) => {
    t.integer('workstation_id').notNullable().references('id').inTable('workstations');
    t.integer('person_id').notNullable().references('id').inTable('people');
    t.primary(['workstation_id', 'person_id']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('workstation_operators');
  await knex.schema.dropTable('dust_agents');
  await knex.schema.dropTable('workstations');
  await knex.schema.dropTable('rooms');
  await knex.schema.dropTable('sites');
}
