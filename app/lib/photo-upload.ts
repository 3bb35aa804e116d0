import 'server-only';
import { jsonError } from './api';
import { reencodePhoto, type ReencodedPhoto } from './reencode-photo';
import type { WriteOptions } from './route-handler';
import { MAX_PHOTO_BYTES } from '@/lib/templates/photo-type';

/** Room for the multipart boundaries and the caption field around the file itself. */
const MULTIPART_OVERHEAD_BYTES = 16 * 1024;
const MAX_MB = MAX_PHOTO_BYTES / (1024 * 1024);

export const PHOTO_EXTENSIONS = { 'image/jpeg': 'jpg', 'image/png': 'png', 'image/webp': 'webp' } as const;

export function photoTooLarge(): Response {
  return jsonError(413, `The photo is larger than ${MAX_MB} MB`, [{ path: 'photo', message: `A photo may be at most ${MAX_MB} MB` }]);
}

/** The write guard's options for a photo upload: multipart only, cut off past the photo limit. */
export const PHOTO_UPLOAD_OPTIONS: WriteOptions = { accepts: ['multipart'], maxBytes: MAX_PHOTO_BYTES + MULTIPART_OVERHEAD_BYTES, tooLarge: photoTooLarge };

/**
 * Reads a `photo` (JPEG, PNG or WebP, at most 10 MB) and an optional `caption` from a multipart
 * upload, the type read from the content and the image re-encoded without its metadata.
 * Refusals come back as the response to send: 413 too large, 415 not an image, 400 unreadable.
 */
export async function readPhotoUpload(request: Request): Promise<{ ok: true; photo: ReencodedPhoto; caption: string } | { ok: false; response: Response }> {
  const refuse = (response: Response) => ({ ok: false as const, response });
  if (Number(request.headers.get('content-length') ?? '0') > MAX_PHOTO_BYTES + MULTIPART_OVERHEAD_BYTES) return refuse(photoTooLarge());
  if (!request.headers.get('content-type')?.startsWith('multipart/form-data'))
    return refuse(jsonError(415, 'Send the photo as multipart/form-data', [{ path: 'photo', message: 'Use a form upload with a "photo" file field' }]));
  let form: FormData;
  try {
    form = await request.formData();
  } catch {
    return refuse(jsonError(400, 'The upload could not be read', [{ path: 'photo', message: 'Send multipart/form-data with a "photo" file field' }]));
  }
  const file = form.get('photo');
  if (!(file instanceof Blob)) return refuse(jsonError(400, 'No photo in the upload', [{ path: 'photo', message: 'Add a "photo" file field' }]));
  if (file.size > MAX_PHOTO_BYTES) return refuse(photoTooLarge());
  const caption = String(form.get('caption') ?? '').trim();
  if (caption.length > 200) return refuse(jsonError(400, 'Some fields are not valid', [{ path: 'caption', message: 'Caption must be at most 200 characters' }]));
  const photo = await reencodePhoto(Buffer.from(await file.arrayBuffer()));
  // Whatever is not a readable JPEG, PNG or WebP is an unsupported media type.
  if (!photo.ok) return refuse(jsonError(415, photo.message, [{ path: 'photo', message: photo.message }]));
  return { ok: true, photo, caption };
}
