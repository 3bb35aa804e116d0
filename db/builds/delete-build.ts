import 'server-only';
import { db } from '@/db/knex';
import { TABLES } from '@/db/tables';

/**
 * Deletes a record with its history, sends and photo rows (ON DELETE CASCADE) and answers the
 * storage keys of its photo files for the caller to remove; null when the workspace has no such record.
 */
export async function deleteBuild(workspaceId: number, id: number): Promise<string[] | null> {
  return db().transaction(async (trx) => {
    const photos: Array<{ storage_key: string; thumb_key: string }> = await trx(TABLES.buildPhotos).where('build_id', id).select('storage_key', 'thumb_key');
    const deleted = await trx(TABLES.builds).where({ id, workspace_id: workspaceId }).del();
    if (deleted === 0) return null;
    return photos.flatMap((p) => [p.storage_key, p.thumb_key]);
  });
}
