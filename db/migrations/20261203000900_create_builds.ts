import type { Knex } from 'knex';
import { TABLES } from '../tables';

/** Build records (one per engine a shop sets up), their history and the sends of the customer's copy. */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable(TABLES.workspaces, (t) => {
    // ± degrees of port duration a build may differ from its template's target (2°: common practice).
    t.double('build_tolerance_deg').notNullable().defaultTo(2);
  });
  await knex.schema.createTable(TABLES.builds, (t) => {
    t.increments('id');
    t.integer('workspace_id').notNullable().references('id').inTable(TABLES.workspaces).onDelete('CASCADE');
    t.string('customer_name', 120).notNullable();
    t.string('customer_email', 120).notNullable().defaultTo('');
    t.string('customer_phone', 40).notNullable().defaultTo('');
    t.string('engine_number', 60).notNullable().defaultTo('');
    t.string('frame_number', 60).notNullable().defaultTo('');
    t.string('engine_description', 200).notNullable().defaultTo('');
    t.integer('template_id').references('id').inTable(TABLES.templates).onDelete('SET NULL');
    t.integer('template_version');
    t.integer('technician_id').references('id').inTable(TABLES.users).onDelete('SET NULL');
    t.enu('status', ['open', 'done', 'handed-over']).notNullable().defaultTo('open');
    t.string('opened_on', 10).notNullable();
    t.string('finished_on', 10);
    t.string('handed_over_on', 10);
    t.double('stroke_mm');
    t.double('rod_mm');
    t.double('pin_offset_mm').notNullable().defaultTo(0);
    t.double('deck_mm');
    t.enu('rotation', ['cw', 'ccw']).notNullable().defaultTo('cw');
    t.double('advance_deg');
    t.text('stops_json');
    t.double('timing_set_deg_btdc');
    t.double('timing_set_mm_btdc');
    t.string('timing_check', 20);
    t.double('timing_check_rpm');
    t.text('ports_json').notNullable().defaultTo('[]');
    t.text('port_targets_json').notNullable().defaultTo('[]');
    t.double('squish_mm');
    t.text('other_measurements_json').notNullable().defaultTo('[]');
    t.text('notes').notNullable().defaultTo('');
    // The results worked out at the last save (TDC, both timing figures, port angles and deviations).
    t.text('results_json').notNullable();
    t.integer('version').notNullable().defaultTo(1);
    t.integer('created_by').references('id').inTable(TABLES.users).onDelete('SET NULL');
    t.integer('updated_by').references('id').inTable(TABLES.users).onDelete('SET NULL');
    t.string('created_at', 30).notNullable();
    t.string('updated_at', 30).notNullable();
    t.index(['workspace_id', 'status', 'updated_at'], 'builds_list_by_status');
    t.index(['template_id'], 'builds_by_template');
  });
  await knex.schema.createTable(TABLES.buildRevisions, (t) => {
    t.increments('id');
    t.integer('build_id').notNullable().references('id').inTable(TABLES.builds).onDelete('CASCADE');
    t.integer('version').notNullable();
    t.enu('action', ['create', 'update']).notNullable();
    t.integer('user_id').references('id').inTable(TABLES.users).onDelete('SET NULL');
    t.string('created_at', 30).notNullable();
    t.text('changes_json').notNullable();
    t.text('snapshot_json').notNullable();
    t.unique(['build_id', 'version']);
  });
  await knex.schema.createTable(TABLES.buildSends, (t) => {
    t.increments('id');
    t.integer('build_id').notNullable().references('id').inTable(TABLES.builds).onDelete('CASCADE');
    t.string('to_email', 120).notNullable();
    t.integer('sent_by').references('id').inTable(TABLES.users).onDelete('SET NULL');
    t.string('sent_at', 30).notNullable();
    t.index(['build_id']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable(TABLES.buildSends);
  await knex.schema.dropTable(TABLES.buildRevisions);
  await knex.schema.dropTable(TABLES.builds);
  await knex.schema.alterTable(TABLES.workspaces, (t) => {
    t.dropColumn('build_tolerance_deg');
  });
}
