import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('people', (t) => {
    t.increments('id').primary();
    t.string('email', 254).notNullable().unique();
    t.string('name', 120).notNullable();
    t.string('role', 20).notNullable();
    t.string('status', 20).notNullable().defaultTo('invited');
    t.string('password_hash', 300).nullable();
    t.string('created_at').notNullable();
    t.string('updated_at').notNullable();
    t.string('last_sign_in_at').nullable();
  });
  await knex.schema.createTable('password_tokens', (t) => {
    t.increments('id').primary();
    t.integer('person_id').notNullable().references('id').inTable('people').onDelete('CASCADE');
    t.string('token_hash', 64).notNullable().unique();
    t.string('purpose', 20).notNullable();
    t.string('expires_at').notNullable();
    t.string('used_at').nullable();
    t.string('created_at').notNullable();
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('password_tokens');
  await knex.schema.dropTable('people');
}
