import 'server-only';
import { randomUUID } from 'node:crypto';
import { PHOTO_EXTENSIONS } from './photo-upload';
import type { ReencodedPhoto } from './reencode-photo';
import { deleteObject, getObject, putObject } from './storage';

/** Where a stored photo's two files are: the re-encoded image and its WebP thumbnail. */
type PhotoKeys = { storageKey: string; thumbKey: string };

/**
 * The files of a photo of a template or a build record (`folder` is `templates/7`, `builds/3`):
 * both files are put first, then `insertRow` records them; when the row cannot be written (the
 * owner was deleted meanwhile) the files are removed again, so no orphan is left behind.
 */
export async function storePhotoFiles<T>(folder: string, photo: ReencodedPhoto, insertRow: (keys: PhotoKeys) => Promise<T>): Promise<T> {
  const base = `${folder}/${randomUUID()}`;
  const keys = { storageKey: `${base}.${PHOTO_EXTENSIONS[photo.contentType]}`, thumbKey: `${base}-thumb.webp` };
  await putObject(keys.storageKey, photo.data, photo.contentType);
  await putObject(keys.thumbKey, photo.thumbnail, 'image/webp');
  try {
    return await insertRow(keys);
  } catch (err) {
    await deletePhotoFiles(keys);
    throw err;
  }
}

export async function deletePhotoFiles(keys: PhotoKeys): Promise<void> {
  await Promise.all([deleteObject(keys.storageKey), deleteObject(keys.thumbKey)]);
}

/** The stored image (`?size=thumb` for the thumbnail) as a private, cacheable response; null when the file is gone. */
export async function photoFileResponse(request: Request, photo: PhotoKeys & { contentType: string }): Promise<Response | null> {
  const thumb = new URL(request.url).searchParams.get('size') === 'thumb';
  const data = await getObject(thumb ? photo.thumbKey : photo.storageKey);
  if (!data) return null;
  return new Response(new Uint8Array(data), {
    headers: {
      'Content-Type': thumb ? 'image/webp' : photo.contentType,
      'Content-Length': String(data.length),
      'Cache-Control': 'private, max-age=3600',
      'X-Content-Type-Options': 'nosniff',
    },
  });
}
