import 'server-only';
import sharp from 'sharp';
import { sniffPhotoType, type PhotoType } from '@/lib/templates/photo-type';

export const THUMBNAIL_EDGE_PX = 320;
/** Longest edge kept for the stored photo; larger phone pictures are scaled down. */
export const PHOTO_EDGE_PX = 2400;

export type ReencodedPhoto = {
  contentType: PhotoType;
  data: Buffer;
  widthPx: number;
  heightPx: number;
  thumbnail: Buffer; // WebP
};

/** Why a file is not taken as a photo, in words for the person who sent it. */
export type PhotoRefusal = { ok: false; message: string };

const FORMAT_TYPES: Record<string, PhotoType> = { jpeg: 'image/jpeg', png: 'image/png', webp: 'image/webp' };

type SharpImage = ReturnType<typeof sharp>;

function encode(image: SharpImage, type: PhotoType): SharpImage {
  if (type === 'image/jpeg') return image.jpeg({ quality: 85, mozjpeg: true });
  if (type === 'image/png') return image.png({ compressionLevel: 9 });
  return image.webp({ quality: 85 });
}

/**
 * Checks a photo by its content (signature, then sharp's own reading of the
 * format, which must agree) and re-encodes it in the same format: turned
 * upright by its EXIF orientation first, then written without any metadata
 * (sharp drops EXIF, XMP, IPTC and ICC unless asked to keep them), plus a
 * WebP thumbnail.
 */
export async function reencodePhoto(input: Buffer): Promise<({ ok: true } & ReencodedPhoto) | PhotoRefusal> {
  const sniffed = sniffPhotoType(input);
  if (!sniffed) return { ok: false, message: 'The file is not a JPEG, PNG or WebP image (checked by its content, not its name)' };
  let format: string | undefined;
  try {
    format = (await sharp(input).metadata()).format;
  } catch {
    return { ok: false, message: 'The image could not be read: the file is damaged or not a JPEG, PNG or WebP image' };
  }
  if (!format || FORMAT_TYPES[format] !== sniffed)
    return { ok: false, message: 'The image content does not match a JPEG, PNG or WebP image' };
  try {
    const upright = sharp(input).rotate().resize(PHOTO_EDGE_PX, PHOTO_EDGE_PX, { fit: 'inside', withoutEnlargement: true });
    const { data, info } = await encode(upright, sniffed).toBuffer({ resolveWithObject: true });
    const thumbnail = await sharp(data)
      .resize(THUMBNAIL_EDGE_PX, THUMBNAIL_EDGE_PX, { fit: 'inside', withoutEnlargement: true })
      .webp({ quality: 80 })
      .toBuffer();
    return { ok: true, contentType: sniffed, data, widthPx: info.width, heightPx: info.height, thumbnail };
  } catch {
    return { ok: false, message: 'The image could not be decoded: the file is damaged' };
  }
}
