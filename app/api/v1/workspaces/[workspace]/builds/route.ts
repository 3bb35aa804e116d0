import { z } from 'zod';
import { jsonError, parseJsonBody } from '@/app/lib/api';
import { requireAction } from '@/app/lib/authz';
import { guarded } from '@/app/lib/route-handler';
import { createBuild } from '@/db/builds/create-build';
import { listBuilds } from '@/db/builds/list-builds';
import { findTemplate } from '@/db/templates/find-template';
import { buildSchema, emptyBuild } from '@/lib/builds/build-schema';
import { buildListQueryFromParams } from '@/lib/builds/list-query';
import { templatePrefill } from '@/lib/builds/template-prefill';
import { toFieldIssues } from '@/lib/sheet/sheet-request';
import { saveResponse, type WorkspaceParams } from './_shared/build-responses';

/** GET …/builds?q=&status=&technician=&template=&sort=&dir=&page=&pageSize= — one page (build.read). */
export async function GET(request: Request, { params }: WorkspaceParams): Promise<Response> {
  return guarded(async () => {
    const access = await requireAction((await params).workspace, 'build.read');
    const query = buildListQueryFromParams(new URL(request.url).searchParams);
    if (!query.success) return jsonError(400, 'Some query parameters are not valid', toFieldIssues(query.error));
    return Response.json(await listBuilds(access.workspace.id, query.data));
  });
}

const jsonObject = z.record(z.string(), z.unknown(), { error: 'Send a JSON object of the record’s fields' });

/**
 * POST …/builds — create (build.edit); 201 with the record at version 1. With a `templateId`
 * the template's geometry, rotation, advance and port targets are the starting values of
 * whatever the body leaves out.
 */
export async function POST(incoming: Request, { params }: WorkspaceParams): Promise<Response> {
  return guarded(incoming, {}, async (request) => {
    const access = await requireAction((await params).workspace, 'build.edit');
    const body = await parseJsonBody(request, jsonObject);
    if (!body.ok) return body.response;
    const templateId = body.data.templateId;
    const template = typeof templateId === 'number' ? await findTemplate(access.workspace.id, templateId) : null;
    const start = { ...emptyBuild(new Date().toISOString().slice(0, 10)), ...(template ? templatePrefill(template) : {}) };
    const parsed = buildSchema.safeParse({ ...start, ...body.data });
    if (!parsed.success) return jsonError(400, 'Some fields are not valid', toFieldIssues(parsed.error));
    const outcome = await createBuild(access.workspace.id, access.user.id, parsed.data);
    const location = outcome.ok ? `${new URL(request.url).pathname}/${outcome.build.id}` : '';
    return saveResponse(outcome, { location });
  });
}
