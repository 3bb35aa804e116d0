import { randomUUID } from 'node:crypto';
import { jsonError } from '@/app/lib/api';
import { deleteObject, putObject } from '@/app/lib/storage';
import { insertPhoto, listPhotos, publicPhoto } from '@/db/templates/photos';
import { MAX_PHOTO_BYTES } from '@/lib/templates/photo-type';
import { reencodePhoto } from '@/app/lib/reencode-photo';
import { guarded } from '@/app/lib/route-handler';
import { type TemplateParams } from '../../_shared/template-params';
import { templateFor } from '../../_shared/template-for';

/** Room for the multipart boundaries and the caption field around the file itself. */
const MULTIPART_OVERHEAD_BYTES = 16 * 1024;
const MAX_MB = MAX_PHOTO_BYTES / (1024 * 1024);
const EXTENSIONS = { 'image/jpeg': 'jpg', 'image/png': 'png', 'image/webp': 'webp' } as const;

function tooLarge(): Response {
  return jsonError(413, `The photo is larger than ${MAX_MB} MB`, [{ path: 'photo', message: `A photo may be at most ${MAX_MB} MB` }]);
}

/** GET …/templates/[id]/photos — the template's photos (metadata), template.read. */
export async function GET(_request: Request, { params }: TemplateParams): Promise<Response> {
  return guarded(async () => {
    const { template } = await templateFor(params, 'template.read');
    return Response.json({ photos: (await listPhotos(template.id)).map(publicPhoto) });
  });
}

/**
 * POST …/templates/[id]/photos — multipart/form-data with `photo` (JPEG, PNG or WebP, at most
 * 10 MB) and an optional `caption`; technician or above. The type is read from the content;
 * the stored file is re-encoded without metadata. Refusals: 413 too large, 415 not an image.
 */
export async function POST(incoming: Request, { params }: TemplateParams): Promise<Response> {
  return guarded(incoming, { accepts: ['multipart'], maxBytes: MAX_PHOTO_BYTES + MULTIPART_OVERHEAD_BYTES, tooLarge }, async (request) => {
    const { access, template } = await templateFor(params, 'template.edit');
    if (Number(request.headers.get('content-length') ?? '0') > MAX_PHOTO_BYTES + MULTIPART_OVERHEAD_BYTES) return tooLarge();
    if (!request.headers.get('content-type')?.startsWith('multipart/form-data'))
      return jsonError(415, 'Send the photo as multipart/form-data', [{ path: 'photo', message: 'Use a form upload with a "photo" file field' }]);

    let form: FormData;
    try {
      form = await request.formData();
    } catch {
      return jsonError(400, 'The upload could not be read', [{ path: 'photo', message: 'Send multipart/form-data with a "photo" file field' }]);
    }
    const file = form.get('photo');
    if (!(file instanceof Blob)) return jsonError(400, 'No photo in the upload', [{ path: 'photo', message: 'Add a "photo" file field' }]);
    if (file.size > MAX_PHOTO_BYTES) return tooLarge();
    const caption = String(form.get('caption') ?? '').trim();
    if (caption.length > 200) return jsonError(400, 'Some fields are not valid', [{ path: 'caption', message: 'Caption must be at most 200 characters' }]);

    const photo = await reencodePhoto(Buffer.from(await file.arrayBuffer()));
    // Whatever is not a readable JPEG, PNG or WebP is an unsupported media type.
    if (!photo.ok) return jsonError(415, photo.message, [{ path: 'photo', message: photo.message }]);

    const base = `templates/${template.id}/${randomUUID()}`;
    const storageKey = `${base}.${EXTENSIONS[photo.contentType]}`;
    const thumbKey = `${base}-thumb.webp`;
    await putObject(storageKey, photo.data, photo.contentType);
    await putObject(thumbKey, photo.thumbnail, 'image/webp');
    try {
      const stored = await insertPhoto({
        templateId: template.id,
        storageKey,
        thumbKey,
        contentType: photo.contentType,
        widthPx: photo.widthPx,
        heightPx: photo.heightPx,
        bytes: photo.data.length,
        caption,
        createdBy: access.user.id,
      });
      return Response.json({ photo: publicPhoto(stored) }, { status: 201 });
    } catch (err) {
      // The template may have been deleted meanwhile: leave no orphan files.
      await Promise.all([deleteObject(storageKey), deleteObject(thumbKey)]);
      throw err;
    }
  });
}
