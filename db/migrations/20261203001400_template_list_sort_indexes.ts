import type { Knex } from 'knex';
import { caseInsensitiveOrder } from '../dialect';
import { TABLES } from '../tables';

/**
 * The template list sorts text case-blind (db/dialect.ts: COLLATE NOCASE on SQLite, lower() on
 * PostgreSQL) and pages by creation date too:
 * indexes in exactly those orders let SQLite walk the page instead of sorting the whole
 * workspace (10,000 templates sorted per request cost ~12 ms). The row id rides along in
 * every index, so `…, id` tie-breaks come in index order as well.
 */
const indexes = (knex: Knex) => ({
  templates_list_by_name_nocase: caseInsensitiveOrder(knex, 'name'),
  templates_list_by_created: 'created_at',
});

export async function up(knex: Knex): Promise<void> {
  for (const [name, column] of Object.entries(indexes(knex)))
    await knex.raw(`CREATE INDEX ${name} ON ${TABLES.templates} (workspace_id, archived, ${column})`);
}

export async function down(knex: Knex): Promise<void> {
  for (const name of Object.keys(indexes(knex))) await knex.raw(`DROP INDEX ${name}`);
}
