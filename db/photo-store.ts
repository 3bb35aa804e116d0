import 'server-only';
import { db } from '@/db/knex';
import type { TemplatePhoto } from '@/lib/templates/template';

/** What every photo row holds, whatever it belongs to (a template or a build record). */
type PhotoFacts = Omit<TemplatePhoto, 'templateId'>;
type Owned<K extends string> = PhotoFacts & { [key in K]: number };
export type StoredPhotoOf<K extends string> = Owned<K> & { storageKey: string; thumbKey: string };

type PhotoRow = {
  id: number;
  storage_key: string;
  thumb_key: string;
  content_type: PhotoFacts['contentType'];
  width_px: number;
  height_px: number;
  bytes: number;
  caption: string;
  created_at: string;
} & Record<string, unknown>;

/**
 * The data access of one photo table: template photos and build photos are the same rows
 * apart from the table and the owner column (`template_id` / `build_id`, read as `templateId` / `buildId`).
 */
export function photoStore<K extends string>(table: string, ownerColumn: string, ownerKey: K) {
  type Stored = StoredPhotoOf<K>;
  const rowToPhoto = (row: PhotoRow): Stored =>
    ({
      id: row.id,
      [ownerKey]: row[ownerColumn] as number,
      contentType: row.content_type,
      widthPx: row.width_px,
      heightPx: row.height_px,
      bytes: row.bytes,
      caption: row.caption,
      createdAt: row.created_at,
      storageKey: row.storage_key,
      thumbKey: row.thumb_key,
    }) as Stored;

  return {
    toPublic(photo: Stored): Owned<K> {
      const { storageKey: _s, thumbKey: _t, ...rest } = photo;
      return rest as Owned<K>;
    },
    async list(ownerId: number): Promise<Stored[]> {
      const rows: PhotoRow[] = await db()(table).where(ownerColumn, ownerId).orderBy('id');
      return rows.map(rowToPhoto);
    },
    async find(ownerId: number, photoId: number): Promise<Stored | null> {
      if (!Number.isSafeInteger(photoId) || photoId < 1) return null;
      const row: PhotoRow | undefined = await db()(table).where({ [ownerColumn]: ownerId, id: photoId }).first();
      return row ? rowToPhoto(row) : null;
    },
    async insert(photo: Omit<Stored, 'id' | 'createdAt'> & { createdBy: number }): Promise<Stored> {
      const [row]: PhotoRow[] = await db()(table)
        .insert({
          [ownerColumn]: (photo as Record<string, unknown>)[ownerKey],
          storage_key: photo.storageKey,
          thumb_key: photo.thumbKey,
          content_type: photo.contentType,
          width_px: photo.widthPx,
          height_px: photo.heightPx,
          bytes: photo.bytes,
          caption: photo.caption,
          created_by: photo.createdBy,
          created_at: new Date().toISOString(),
        })
        .returning('*');
      return rowToPhoto(row!);
    },
    async deleteRow(photoId: number): Promise<void> {
      await db()(table).where('id', photoId).del();
    },
  };
}
