import type { Knex } from 'knex';
import { TABLES } from '../tables';

/** Photos of a build record (the engine as set up), stored like template photos. */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable(TABLES.buildPhotos, (t) => {
    t.increments('id');
    t.integer('build_id').notNullable().references('id').inTable(TABLES.builds).onDelete('CASCADE');
    t.string('storage_key', 200).notNullable();
    t.string('thumb_key', 200).notNullable();
    t.string('content_type', 40).notNullable();
    t.integer('width_px').notNullable();
    t.integer('height_px').notNullable();
    t.integer('bytes').notNullable();
    t.string('caption', 200).notNullable().defaultTo('');
    t.integer('created_by').references('id').inTable(TABLES.users).onDelete('SET NULL');
    t.string('created_at', 30).notNullable();
    t.index(['build_id']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable(TABLES.buildPhotos);
}
