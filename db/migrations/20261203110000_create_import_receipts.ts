import type { Knex } from 'knex';
import { TABLES } from '../tables';

/**
 * The answer to each CSV import sent with an Idempotency-Key, written in the import's own
 * transaction: a client that lost the connection retries with the same key and gets the
 * first answer instead of a second import.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable(TABLES.importReceipts, (t) => {
    t.increments('id');
    t.integer('workspace_id').notNullable().references('id').inTable(TABLES.workspaces).onDelete('CASCADE');
    t.string('idempotency_key', 255).notNullable();
    t.integer('user_id').references('id').inTable(TABLES.users).onDelete('SET NULL');
    t.string('body_sha256', 64).notNullable();
    t.integer('status').notNullable();
    t.text('response_json').notNullable();
    t.string('created_at', 30).notNullable();
    t.unique(['workspace_id', 'idempotency_key']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable(TABLES.importReceipts);
}
