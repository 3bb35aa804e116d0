import type { Knex } from 'knex';
import { TABLES } from '../tables';

/** Printer profiles saved per workspace (visitors keep theirs in the browser). */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable(TABLES.printerProfiles, (t) => {
    t.increments('id');
    t.integer('workspace_id').notNullable().references('id').inTable(TABLES.workspaces).onDelete('CASCADE');
    t.string('name', 60).notNullable();
    t.double('scale_x').notNullable();
    t.double('scale_y').notNullable();
    // The whole validated profile as JSON, so fields the profile schema gains later are kept.
    t.text('profile_json').notNullable();
    t.integer('created_by').references('id').inTable(TABLES.users).onDelete('SET NULL');
    t.timestamp('created_at').notNullable().defaultTo(knex.fn.now());
    t.index(['workspace_id']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable(TABLES.printerProfiles);
}
