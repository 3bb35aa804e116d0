import 'server-only';
import { db } from '@/db/knex';
import { TABLES } from '@/db/tables';
import type { TemplatePhoto } from '@/lib/templates/template';

type PhotoRow = {
  id: number;
  template_id: number;
  storage_key: string;
  thumb_key: string;
  content_type: TemplatePhoto['contentType'];
  width_px: number;
  height_px: number;
  bytes: number;
  caption: string;
  created_at: string;
};

export type StoredPhoto = TemplatePhoto & { storageKey: string; thumbKey: string };

function rowToPhoto(row: PhotoRow): StoredPhoto {
  return {
    id: row.id,
    templateId: row.template_id,
    contentType: row.content_type,
    widthPx: row.width_px,
    heightPx: row.height_px,
    bytes: row.bytes,
    caption: row.caption,
    createdAt: row.created_at,
    storageKey: row.storage_key,
    thumbKey: row.thumb_key,
  };
}

export function publicPhoto(photo: StoredPhoto): TemplatePhoto {
  const { storageKey: _s, thumbKey: _t, ...rest } = photo;
  return rest;
}

export async function listPhotos(templateId: number): Promise<StoredPhoto[]> {
  const rows: PhotoRow[] = await db()(TABLES.templatePhotos).where('template_id', templateId).orderBy('id');
  return rows.map(rowToPhoto);
}

export async function findPhoto(templateId: number, photoId: number): Promise<StoredPhoto | null> {
  if (!Number.isSafeInteger(photoId) || photoId < 1) return null;
  const row: PhotoRow | undefined = await db()(TABLES.templatePhotos).where({ template_id: templateId, id: photoId }).first();
  return row ? rowToPhoto(row) : null;
}

export type NewPhoto = Omit<StoredPhoto, 'id' | 'createdAt'> & { createdBy: number };

export async function insertPhoto(photo: NewPhoto): Promise<StoredPhoto> {
  const [row]: PhotoRow[] = await db()(TABLES.templatePhotos)
    .insert({
      template_id: photo.templateId,
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
}

export async function deletePhotoRow(photoId: number): Promise<void> {
  await db()(TABLES.templatePhotos).where('id', photoId).del();
}
