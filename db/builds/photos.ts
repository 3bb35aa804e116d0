import 'server-only';
import { db } from '@/db/knex';
import { TABLES } from '@/db/tables';
import type { BuildPhoto } from '@/lib/builds/build';

type PhotoRow = {
  id: number;
  build_id: number;
  storage_key: string;
  thumb_key: string;
  content_type: BuildPhoto['contentType'];
  width_px: number;
  height_px: number;
  bytes: number;
  caption: string;
  created_at: string;
};

export type StoredBuildPhoto = BuildPhoto & { storageKey: string; thumbKey: string };

function rowToPhoto(row: PhotoRow): StoredBuildPhoto {
  return {
    id: row.id,
    buildId: row.build_id,
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

export function publicBuildPhoto(photo: StoredBuildPhoto): BuildPhoto {
  const { storageKey: _s, thumbKey: _t, ...rest } = photo;
  return rest;
}

export async function listBuildPhotos(buildId: number): Promise<StoredBuildPhoto[]> {
  const rows: PhotoRow[] = await db()(TABLES.buildPhotos).where('build_id', buildId).orderBy('id');
  return rows.map(rowToPhoto);
}

export async function findBuildPhoto(buildId: number, photoId: number): Promise<StoredBuildPhoto | null> {
  const row: PhotoRow | undefined = await db()(TABLES.buildPhotos).where({ build_id: buildId, id: photoId }).first();
  return row ? rowToPhoto(row) : null;
}

export async function insertBuildPhoto(photo: Omit<StoredBuildPhoto, 'id' | 'createdAt'> & { createdBy: number }): Promise<StoredBuildPhoto> {
  const [row]: PhotoRow[] = await db()(TABLES.buildPhotos)
    .insert({
      build_id: photo.buildId,
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

export async function deleteBuildPhotoRow(photoId: number): Promise<void> {
  await db()(TABLES.buildPhotos).where('id', photoId).del();
}
