import type { Knex } from 'knex';
import { TABLES } from '../tables';

/** The printer profile a workspace's sheets are corrected with unless someone picks another. */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable(TABLES.workspaces, (t) => {
    t.integer('default_printer_profile_id').references('id').inTable(TABLES.printerProfiles).onDelete('SET NULL');
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable(TABLES.workspaces, (t) => {
    t.dropForeign(['default_printer_profile_id']);
    t.dropColumn('default_printer_profile_id');
  });
}
