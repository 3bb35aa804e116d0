import type { Knex } from 'knex';
import { TABLES } from '../tables';

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable(TABLES.templates, (t) => {
    t.increments('id');
    t.integer('workspace_id').notNullable().references('id').inTable(TABLES.workspaces).onDelete('CASCADE');
    t.string('name', 80).notNullable();
    t.string('description', 200).notNullable().defaultTo('');
    t.double('bore_mm');
    t.double('stroke_mm');
    t.double('rod_mm');
    t.enu('rotation', ['cw', 'ccw']).notNullable().defaultTo('cw');
    t.double('rim_diameter_mm');
    t.double('face_diameter_mm');
    t.double('flange_diameter_mm');
    t.double('hub_hole_mm');
    t.double('static_advance_deg');
    t.text('advance_marks_json').notNullable().defaultTo('[]');
    t.text('port_targets_json').notNullable().defaultTo('[]');
    t.text('notes').notNullable().defaultTo('');
    t.boolean('archived').notNullable().defaultTo(false);
    t.integer('version').notNullable().defaultTo(1);
    t.integer('created_by').references('id').inTable(TABLES.users).onDelete('SET NULL');
    t.integer('updated_by').references('id').inTable(TABLES.users).onDelete('SET NULL');
    t.string('created_at', 30).notNullable();
    t.string('updated_at', 30).notNullable();
    // The list filters by workspace and archived flag and pages in name or update order.
    t.index(['workspace_id', 'archived', 'name'], 'templates_list_by_name');
    t.index(['workspace_id', 'archived', 'updated_at'], 'templates_list_by_updated');
  });
  await knex.schema.createTable(TABLES.templatePhotos, (t) => {
    t.increments('id');
    t.integer('template_id').notNullable().references('id').inTable(TABLES.templates).onDelete('CASCADE');
    t.string('storage_key', 200).notNullable();
    t.string('thumb_key', 200).notNullable();
    t.string('content_type', 40).notNullable();
    t.integer('width_px').notNullable();
    t.integer('height_px').notNullable();
    t.integer('bytes').notNullable();
    t.string('caption', 200).notNullable().defaultTo('');
    t.integer('created_by').references('id').inTable(TABLES.users).onDelete('SET NULL');
    t.string('created_at', 30).notNullable();
    t.index(['template_id']);
  });
  await knex.schema.createTable(TABLES.templateRevisions, (t) => {
    t.increments('id');
    t.integer('template_id').notNullable().references('id').inTable(TABLES.templates).onDelete('CASCADE');
    t.integer('version').notNullable();
    t.enu('action', ['create', 'update', 'restore', 'import']).notNullable();
    t.integer('restored_from_version');
    t.integer('user_id').references('id').inTable(TABLES.users).onDelete('SET NULL');
    t.string('created_at', 30).notNullable();
    t.text('changes_json').notNullable();
    // The whole template after this revision, so any revision can be restored.
    t.text('snapshot_json').notNullable();
    t.unique(['template_id', 'version']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable(TABLES.templateRevisions);
  await knex.schema.dropTable(TABLES.templatePhotos);
  await knex.schema.dropTable(TABLES.templates);
}
