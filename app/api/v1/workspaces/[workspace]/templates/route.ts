import { jsonError, parseJsonBody } from '@/app/lib/api';
import { requireAction } from '@/app/lib/authz';
import { createTemplate } from '@/db/templates/create-template';
import { listTemplates } from '@/db/templates/list-templates';
import { toFieldIssues } from '@/lib/sheet/sheet-request';
import { listQueryFromParams } from '@/lib/templates/list-query';
import { templateSchema } from '@/lib/templates/template-schema';
import { guarded } from '@/app/lib/route-handler';
import { type WorkspaceParams } from './_shared/template-params';

/** GET …/templates?q=&sort=&dir=&archived=false|true|all&page=&pageSize= — one page (template.read). */
export async function GET(request: Request, { params }: WorkspaceParams): Promise<Response> {
  return guarded(async () => {
    const { workspace } = await params;
    const access = await requireAction(workspace, 'template.read');
    const query = listQueryFromParams(new URL(request.url).searchParams);
    if (!query.success) return jsonError(400, 'Some query parameters are not valid', toFieldIssues(query.error));
    return Response.json(await listTemplates(access.workspace.id, query.data));
  });
}

/** POST …/templates — create (template.edit); answers 201 with the template at version 1. */
export async function POST(incoming: Request, { params }: WorkspaceParams): Promise<Response> {
  return guarded(incoming, {}, async (request) => {
    const { workspace } = await params;
    const access = await requireAction(workspace, 'template.edit');
    const body = await parseJsonBody(request, templateSchema);
    if (!body.ok) return body.response;
    const template = await createTemplate(access.workspace.id, access.user.id, body.data);
    return Response.json({ template }, { status: 201, headers: { Location: `${new URL(request.url).pathname}/${template.id}` } });
  });
}
