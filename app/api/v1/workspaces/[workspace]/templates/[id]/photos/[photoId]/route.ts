import type { Action } from '@/lib/access-policy';
import { parsePathId } from '@/lib/path-id';
import { deleteObject, getObject } from '@/app/lib/storage';
import { deletePhotoRow, findPhoto } from '@/db/templates/photos';
import { guarded } from '@/app/lib/route-handler';
import { templateNotFound } from '../../../_shared/template-params';
import { templateFor } from '../../../_shared/template-for';

type Params = { params: Promise<{ workspace: string; id: string; photoId: string }> };

async function locate(params: Params['params'], action: Action) {
  const { template } = await templateFor(params, action);
  const photoNumber = parsePathId((await params).photoId);
  return photoNumber ? findPhoto(template.id, photoNumber) : null;
}

/** GET …/photos/[photoId] (`?size=thumb` for the WebP thumbnail) — the stored image (template.read). */
export async function GET(request: Request, { params }: Params): Promise<Response> {
  return guarded(async () => {
    const photo = await locate(params, 'template.read');
    if (!photo) return templateNotFound();
    const thumb = new URL(request.url).searchParams.get('size') === 'thumb';
    const data = await getObject(thumb ? photo.thumbKey : photo.storageKey);
    if (!data) return templateNotFound();
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

/** DELETE …/photos/[photoId] — template.edit; removes the row and both files. */
export async function DELETE(incoming: Request, { params }: Params): Promise<Response> {
  return guarded(incoming, {}, async () => {
    const photo = await locate(params, 'template.edit');
    if (!photo) return templateNotFound();
    await deletePhotoRow(photo.id);
    await Promise.all([deleteObject(photo.storageKey), deleteObject(photo.thumbKey)]);
    return new Response(null, { status: 204 });
  });
}
