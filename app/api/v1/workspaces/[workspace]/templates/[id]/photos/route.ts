import { recordAudit } from '@/db/audit-log';
import { insertPhoto, listPhotos, publicPhoto } from '@/db/templates/photos';
import { storePhotoFiles } from '@/app/lib/photo-files';
import { PHOTO_UPLOAD_OPTIONS, readPhotoUpload } from '@/app/lib/photo-upload';
import { guarded } from '@/app/lib/route-handler';
import { type TemplateParams } from '../../_shared/template-params';
import { templateFor } from '../../_shared/template-for';

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
  return guarded(incoming, PHOTO_UPLOAD_OPTIONS, async (request) => {
    const { access, template } = await templateFor(params, 'template.edit');
    const upload = await readPhotoUpload(request);
    if (!upload.ok) return upload.response;
    const { photo, caption } = upload;
    const stored = await storePhotoFiles(`templates/${template.id}`, photo, async (keys) => {
      const row = await insertPhoto({ ...keys, templateId: template.id, contentType: photo.contentType, widthPx: photo.widthPx, heightPx: photo.heightPx, bytes: photo.data.length, caption, createdBy: access.user.id });
      await recordAudit({ action: 'photo-added', actorUserId: access.user.id, workspaceId: access.workspace.id, detail: { templateId: template.id, name: template.name } });
      return row;
    });
    return Response.json({ photo: publicPhoto(stored) }, { status: 201 });
  });
}
