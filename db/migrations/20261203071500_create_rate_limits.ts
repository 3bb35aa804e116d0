import type { Knex } from 'knex';
import { TABLES } from '../tables';

/**
 * Rate-limit counters shared by every app instance and kept across restarts. The columns
 * are the ones rate-limiter-flexible's SQLite and PostgreSQL stores read and write
 * (key, points, expire in epoch milliseconds); the app tells them the table exists.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable(TABLES.rateLimits, (t) => {
    t.string('key', 255).primary();
    t.integer('points').notNullable().defaultTo(0);
    t.bigInteger('expire');
    t.index(['expire']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable(TABLES.rateLimits);
}
