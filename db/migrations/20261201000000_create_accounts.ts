import type { Knex } from 'knex';
import { TABLES } from '../tables';

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable(TABLES.users, (t) => {
    t.increments('id');
    t.string('email', 254).notNullable().unique();
    t.string('name', 120).notNullable();
    t.string('password_hash', 120);
    t.timestamp('email_verified_at');
    t.timestamp('created_at').notNullable().defaultTo(knex.fn.now());
  });
  await knex.schema.createTable(TABLES.workspaces, (t) => {
    t.increments('id');
    t.string('slug', 60).notNullable().unique();
    t.string('name', 120).notNullable();
    t.enu('kind', ['personal', 'shop']).notNullable();
    t.timestamp('created_at').notNullable().defaultTo(knex.fn.now());
  });
  await knex.schema.createTable(TABLES.memberships, (t) => {
    t.increments('id');
    t.integer('user_id').notNullable().references('id').inTable(TABLES.users).onDelete('CASCADE');
    t.integer('workspace_id').notNullable().references('id').inTable(TABLES.workspaces).onDelete('CASCADE');
    t.enu('role', ['owner', 'technician', 'viewer']).notNullable();
    t.timestamp('created_at').notNullable().defaultTo(knex.fn.now());
    t.unique(['user_id', 'workspace_id']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable(TABLES.memberships);
  await knex.schema.dropTable(TABLES.workspaces);
  await knex.schema.dropTable(TABLES.users);
}
