import { jsonError } from '@/app/lib/api';
import { NOT_FOUND_MESSAGE } from '@/app/lib/authz';
import { guarded } from '@/app/lib/route-handler';
import { deleteObject, getObject } from '@/app/lib/storage';
import { deleteBuildPhotoRow, findBuildPhoto } from '@/db/builds/photos';
import type { Action } from '@/lib/access-policy';
import { parsePathId } from '@/lib/path-id';
import { buildFor } from '../../../_shared/build-responses';

type Params = { params: Promise<{ workspace: string; id: string; photoId: string }> };

async function locate(params: Params['params'], action: Action) {
  const { build } = await buildFor(params, action);
  const photoNumber = parsePathId((await params).photoId);
  return photoNumber ? findBuildPhoto(build.id, photoNumber) : null;
}

/** GET …/photos/[photoId] (`?size=thumb` for the WebP thumbnail) — the stored image (build.read). */
export async function GET(request: Request, { params }: Params): Promise<Response> {
  return guarded(async () => {
    const photo = await locate(params, 'build.read');
    if (!photo) return jsonError(404, NOT_FOUND_MESSAGE);
    const thumb = new URL(request.url).searchParams.get('size') === 'thumb';
    const data = await getObject(thumb ? photo.thumbKey : photo.storageKey);
    if (!data) return jsonError(404, NOT_FOUND_MESSAGE);
    return new Response(new Uint8Array(data), {
      headers: {
        'Content-Type': thumb ? 'image/webp' : photo.contentType,
        'Content-Length': String(data.length),
        'Cache-Control': 'private, max-age=3600',
        'X-Content-Type-Options': 'nosniff',
      },
    });
  });
}

/** DELETE …/photos/[photoId] — build.edit; removes the row and both files. */
export async function DELETE(incoming: Request, { params }: Params): Promise<Response> {
  return guarded(incoming, {}, async () => {
    const photo = await locate(params, 'build.edit');
    if (!photo) return jsonError(404, NOT_FOUND_MESSAGE);
    await deleteBuildPhotoRow(photo.id);
    await Promise.all([deleteObject(photo.storageKey), deleteObject(photo.thumbKey)]);
    return new Response(null, { status: 204 });
  });
}
