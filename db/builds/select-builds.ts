import type { Knex } from 'knex';
import { TABLES } from '@/db/tables';

/** Builds of one workspace with the names of their technician, template, creator and last editor. */
export function selectBuilds(knex: Knex | Knex.Transaction, workspaceId: number) {
  return knex(`${TABLES.builds} as b`)
    .leftJoin(`${TABLES.users} as cu`, 'cu.id', 'b.created_by')
    .leftJoin(`${TABLES.users} as uu`, 'uu.id', 'b.updated_by')
    .leftJoin(`${TABLES.users} as tu`, 'tu.id', 'b.technician_id')
    .leftJoin(`${TABLES.templates} as t`, 't.id', 'b.template_id')
    .where('b.workspace_id', workspaceId)
    .select('b.*', 'cu.name as created_by_name', 'uu.name as updated_by_name', 'tu.name as technician_name', 't.name as template_name');
}
