import { randomUUID } from 'node:crypto';
import { PHOTO_EXTENSIONS, PHOTO_UPLOAD_OPTIONS, readPhotoUpload } from '@/app/lib/photo-upload';
import { guarded } from '@/app/lib/route-handler';
import { deleteObject, putObject } from '@/app/lib/storage';
import { insertBuildPhoto, listBuildPhotos, publicBuildPhoto } from '@/db/builds/photos';
import { buildFor, type BuildParams } from '../../_shared/build-responses';

/** GET …/builds/[id]/photos — the record's photos (metadata), build.read. */
export async function GET(_request: Request, { params }: BuildParams): Promise<Response> {
  return guarded(async () => {
    const { build } = await buildFor(params, 'build.read');
    return Response.json({ photos: (await listBuildPhotos(build.id)).map(publicBuildPhoto) });
  });
}

/**
 * POST …/builds/[id]/photos — multipart/form-data with `photo` and an optional `caption` (build.edit),
 * through the same pipeline as template photos: type read from the content, re-encoded without metadata.
 */
export async function POST(incoming: Request, { params }: BuildParams): Promise<Response> {
  return guarded(incoming, PHOTO_UPLOAD_OPTIONS, async (request) => {
    const { access, build } = await buildFor(params, 'build.edit');
    const upload = await readPhotoUpload(request);
    if (!upload.ok) return upload.response;
    const { photo, caption } = upload;
    const base = `builds/${build.id}/${randomUUID()}`;
    const storageKey = `${base}.${PHOTO_EXTENSIONS[photo.contentType]}`;
    const thumbKey = `${base}-thumb.webp`;
    await putObject(storageKey, photo.data);
    await putObject(thumbKey, photo.thumbnail);
    try {
      const stored = await insertBuildPhoto({
        buildId: build.id,
        storageKey,
        thumbKey,
        contentType: photo.contentType,
        widthPx: photo.widthPx,
        heightPx: photo.heightPx,
        bytes: photo.data.length,
        caption,
        createdBy: access.user.id,
      });
      return Response.json({ photo: publicBuildPhoto(stored) }, { status: 201 });
    } catch (err) {
      // The record may have been deleted meanwhile: leave no orphan files.
      await Promise.all([deleteObject(storageKey), deleteObject(thumbKey)]);
      throw err;
    }
  });
}
