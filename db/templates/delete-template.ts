import 'server-only';
import { db } from '@/db/knex';
import { TABLES } from '@/db/tables';

/**
 * Deletes a template with its revisions and photo rows (ON DELETE CASCADE) and
 * answers the storage keys of its photo files, for the caller to remove; null if missing.
 */
export async function deleteTemplate(workspaceId: number, id: number): Promise<string[] | null> {
  return db().transaction(async (trx) => {
    const photos: Array<{ storage_key: string; thumb_key: string }> = await trx(TABLES.templatePhotos)
      .where('template_id', id)
      .select('storage_key', 'thumb_key');
    const deleted = await trx(TABLES.templates).where({ id, workspace_id: workspaceId }).del();
    if (deleted === 0) return null;
    return photos.flatMap((p) => [p.storage_key, p.thumb_key]);
  });
}
