import { storePhotoFiles } from '@/app/lib/photo-files';
import { PHOTO_UPLOAD_OPTIONS, readPhotoUpload } from '@/app/lib/photo-upload';
import { guarded } from '@/app/lib/route-handler';
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
    const stored = await storePhotoFiles(`builds/${build.id}`, photo, (keys) =>
      insertBuildPhoto({ ...keys, buildId: build.id, contentType: photo.contentType, widthPx: photo.widthPx, heightPx: photo.heightPx, bytes: photo.data.length, caption, createdBy: access.user.id }),
    );
    return Response.json({ photo: publicBuildPhoto(stored) }, { status: 201 });
  });
}
