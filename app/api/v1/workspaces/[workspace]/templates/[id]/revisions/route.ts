import { requireRole } from '@/app/lib/authz';
import { findTemplate } from '@/db/templates/find-template';
import { listRevisions } from '@/db/templates/revisions';
import { handle, parseId, templateNotFound, type TemplateParams } from '../../_shared/handle';

/** GET …/templates/[id]/revisions — the history, newest first: who, when, fields old → new. Viewer or above. */
export async function GET(_request: Request, { params }: TemplateParams): Promise<Response> {
  return handle(async () => {
    const { workspace, id } = await params;
    const access = await requireRole(workspace, 'viewer');
    const templateId = parseId(id);
    const template = templateId ? await findTemplate(access.workspace.id, templateId) : null;
    if (!template) return templateNotFound();
    return Response.json({ revisions: await listRevisions(template.id) });
  });
}
