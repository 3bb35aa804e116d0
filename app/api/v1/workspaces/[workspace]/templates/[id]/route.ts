import { parsePathId } from '@/lib/path-id';
import { parseJsonBody } from '@/app/lib/api';
import { requireAction } from '@/app/lib/authz';
import { deleteObject } from '@/app/lib/storage';
import { deleteTemplate } from '@/db/templates/delete-template';
import { listPhotos, publicPhoto } from '@/db/templates/photos';
import { updateTemplate } from '@/db/templates/update-template';
import { templatePatchSchema } from '@/lib/templates/template-schema';
import { guarded } from '@/app/lib/route-handler';
import { templateNotFound, type TemplateParams } from '../_shared/template-params';
import { updateResponse } from '../_shared/responses';
import { templateFor } from '../_shared/template-for';
import { dateFormatOf } from '@/app/lib/date-format';

/** GET …/templates/[id] — the template and its photos (template.read). */
export async function GET(_request: Request, { params }: TemplateParams): Promise<Response> {
  return guarded(async () => {
    const { template } = await templateFor(params, 'template.read');
    const photos = (await listPhotos(template.id)).map(publicPhoto);
    return Response.json({ template, photos });
  });
}

/**
 * PATCH …/templates/[id] — `{ version, ...fields }`, technician or above. The version is the
 * one the edit started from; if someone saved in between the answer is 409 and nothing is written.
 * `{ version, archived: true }` archives.
 */
export async function PATCH(incoming: Request, { params }: TemplateParams): Promise<Response> {
  return guarded(incoming, {}, async (request) => {
    const { workspace, id } = await params;
    const access = await requireAction(workspace, 'template.edit');
    const templateId = parsePathId(id);
    if (!templateId) return templateNotFound();
    const body = await parseJsonBody(request, templatePatchSchema);
    if (!body.ok) return body.response;
    const { version, ...changes } = body.data;
    return updateResponse(await updateTemplate(access.workspace.id, templateId, access.user.id, version, changes), dateFormatOf(request));
  });
}

/** DELETE …/templates/[id] — template.delete: removes the template, its history and its photo files. */
export async function DELETE(incoming: Request, { params }: TemplateParams): Promise<Response> {
  return guarded(incoming, {}, async () => {
    const { workspace, id } = await params;
    const access = await requireAction(workspace, 'template.delete');
    const templateId = parsePathId(id);
    const keys = templateId ? await deleteTemplate(access.workspace.id, templateId) : null;
    if (!keys) return templateNotFound();
    await Promise.all(keys.map(deleteObject));
    return new Response(null, { status: 204 });
  });
}
