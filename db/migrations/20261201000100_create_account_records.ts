import type { Knex } from 'knex';
import { TABLES } from '../tables';

/** One-time tokens (e-mail verification, password reset), invitations and the audit log. */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable(TABLES.oneTimeTokens, (t) => {
    t.increments('id');
    t.enu('purpose', ['verify-email', 'reset-password']).notNullable();
    t.integer('user_id').notNullable().references('id').inTable(TABLES.users).onDelete('CASCADE');
    // Only a SHA-256 of the token is stored; the token itself lives in the e-mailed link.
    t.string('token_hash', 64).notNullable().unique();
    t.timestamp('expires_at').notNullable();
    t.timestamp('used_at');
    t.timestamp('created_at').notNullable().defaultTo(knex.fn.now());
  });
  await knex.schema.createTable(TABLES.invitations, (t) => {
    t.increments('id');
    t.integer('workspace_id').notNullable().references('id').inTable(TABLES.workspaces).onDelete('CASCADE');
    t.string('email', 254).notNullable();
    t.enu('role', ['owner', 'technician', 'viewer']).notNullable();
    t.integer('invited_by').references('id').inTable(TABLES.users).onDelete('SET NULL');
    t.string('token_hash', 64).notNullable().unique();
    t.timestamp('expires_at').notNullable();
    t.timestamp('accepted_at');
    t.timestamp('revoked_at');
    t.timestamp('created_at').notNullable().defaultTo(knex.fn.now());
    t.index(['workspace_id']);
  });
  await knex.schema.createTable(TABLES.auditLog, (t) => {
    t.increments('id');
    t.integer('workspace_id').references('id').inTable(TABLES.workspaces).onDelete('CASCADE');
    t.integer('actor_user_id').references('id').inTable(TABLES.users).onDelete('SET NULL');
    t.string('action', 40).notNullable();
    t.text('detail').notNullable().defaultTo('{}');
    t.timestamp('created_at').notNullable().defaultTo(knex.fn.now());
    t.index(['workspace_id', 'created_at']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable(TABLES.auditLog);
  await knex.schema.dropTable(TABLES.invitations);
  await knex.schema.dropTable(TABLES.oneTimeTokens);
}
