import 'server-only';
import { db } from '@/db/knex';
import { TABLES } from '@/db/tables';

/** Deletes a record with its history and sends (ON DELETE CASCADE); false when the workspace has no such record. */
export async function deleteBuild(workspaceId: number, id: number): Promise<boolean> {
  return (await db()(TABLES.builds).where({ id, workspace_id: workspaceId }).del()) > 0;
}
