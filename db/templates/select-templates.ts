import type { Knex } from 'knex';
import { TABLES } from '@/db/tables';

/** Templates of one workspace with the names of their creator and last editor. */
export function selectTemplates(knex: Knex | Knex.Transaction, workspaceId: number) {
  return knex(`${TABLES.templates} as t`)
    .leftJoin(`${TABLES.users} as cu`, 'cu.id', 't.created_by')
    .leftJoin(`${TABLES.users} as uu`, 'uu.id', 't.updated_by')
    .where('t.workspace_id', workspaceId)
    .select('t.*', 'cu.name as created_by_name', 'uu.name as updated_by_name');
}
