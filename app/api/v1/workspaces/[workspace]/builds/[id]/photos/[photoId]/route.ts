import { jsonError } from '@/app/lib/api';
import { NOT_FOUND_MESSAGE } from '@/app/lib/authz';
import { deletePhotoFiles, photoFileResponse } from '@/app/lib/photo-files';
import { guarded } from '@/app/lib/route-handler';
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
    return (photo && (await photoFileResponse(request, photo))) ?? jsonError(404, NOT_FOUND_MESSAGE);
  });
}

/** DELETE …/photos/[photoId] — build.edit; removes the row and both files. */
export async function DELETE(incoming: Request, { params }: Params): Promise<Response> {
  return guarded(incoming, {}, async () => {
    const photo = await locate(params, 'build.edit');
    if (!photo) return jsonError(404, NOT_FOUND_MESSAGE);
    await deleteBuildPhotoRow(photo.id);
    await deletePhotoFiles(photo);
    return new Response(null, { status: 204 });
  });
}
