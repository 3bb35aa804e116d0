import type { Knex } from 'knex';
import { TABLES } from '../tables';

/** Sessions carry the user's session version; raising it (on a password reset) ends every older session. */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable(TABLES.users, (t) => {
    t.integer('session_version').notNullable().defaultTo(0);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable(TABLES.users, (t) => {
    t.dropColumn('session_version');
  });
}
