import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('size_profiles', (t) => {
    t.increments('id').primary();
    t.string('name', 120).notNullable();
    t.string('kind', 20).notNullable();
    t.text('input').notNullable();
    t.text('bins').notNullable();
    t.double('fitted_mmad_m').nullable();
    t.double('fitted_gsd').nullable();
    t.double('respirable_fraction').notNullable();
    t.double('thoracic_fraction').notNullable();
    t.double('inhalable_fraction').notNullable();
    t.integer('created_by').nullable().references('id').inTable('people');
    t.string('created_at').notNullable();
    t.string('deleted_at').nullable().index();
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('size_profiles');
}
