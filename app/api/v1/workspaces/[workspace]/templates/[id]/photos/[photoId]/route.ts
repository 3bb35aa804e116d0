import type { Action } from '@/lib/access-policy';
import { parsePathId } from '@/lib/path-id';
import { recordAudit } from '@/db/audit-log';
import { deletePhotoRow, findPhoto } from '@/db/templates/photos';
import { deletePhotoFiles, photoFileResponse } from '@/app/lib/photo-files';
import { guarded } from '@/app/lib/route-handler';
import { templateNotFound } from '../../../_shared/template-params';
import { templateFor } from '../../../_shared/template-for';

type Params = { params: Promise<{ workspace: string; id: string; photoId: string }> };

async function locate(params: Params['params'], action: Action) {
  const { access, template } = await templateFor(params, action);
  const photoNumber = parsePathId((await params).photoId);
  return { access, template, photo: photoNumber ? await findPhoto(template.id, photoNumber) : null };
}

/** GET …/photos/[photoId] (`?size=thumb` for the WebP thumbnail) — the stored image (template.read). */
export async function GET(request: Request, { params }: Params): Promise<Response> {
  return guarded(async () => {
    const { photo } = await locate(params, 'template.read');
    return (photo && (await photoFileResponse(request, photo))) ?? templateNotFound();
  });
}

/** DELETE …/photos/[photoId] — template.edit; removes the row, both files, and says so in the activity. */
export async function DELETE(incoming: Request, { params }: Params): Promise<Response> {
  return guarded(incoming, {}, async () => {
    const { access, template, photo } = await locate(params, 'template.edit');
    if (!photo) return templateNotFound();
    await deletePhotoRow(photo.id);
    await recordAudit({ action: 'photo-deleted', actorUserId: access.user.id, workspaceId: access.workspace.id, detail: { templateId: template.id, name: template.name } });
    await deletePhotoFiles(photo);
    return new Response(null, { status: 204 });
  });
}
