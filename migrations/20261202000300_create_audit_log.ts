import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('audit_log', (t) => {
    t.increments('id').primary();
    t.integer('actor_id').nullable().references('id').inTable('people');
    t.string('actor_email', 254).nullable();
    t.string('action', 60).notNullable();
    t.string('target_type', 40).nullable();
    t.string('target_id', 60).nullable();
    t.text('detail').nullable();
    t.string('created_at').notNullable().index();
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('audit_log');
}
