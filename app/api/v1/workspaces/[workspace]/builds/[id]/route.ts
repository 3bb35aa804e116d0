import { jsonError, parseJsonBody } from '@/app/lib/api';
import { NOT_FOUND_MESSAGE, requireAction } from '@/app/lib/authz';
import { guarded } from '@/app/lib/route-handler';
import { deleteObject } from '@/app/lib/storage';
import { deleteBuild } from '@/db/builds/delete-build';
import { updateBuild } from '@/db/builds/update-build';
import { can } from '@/lib/access-policy';
import { buildPatchSchema } from '@/lib/builds/build-schema';
import { parsePathId } from '@/lib/path-id';
import { buildFor, saveResponse, type BuildParams } from '../_shared/build-responses';

/** GET …/builds/[id] — the record with its computed results and sends (build.read). */
export async function GET(_request: Request, { params }: BuildParams): Promise<Response> {
  return guarded(async () => Response.json({ build: (await buildFor(params, 'build.read')).build }));
}

/**
 * PATCH …/builds/[id] — `{ version, ...fields }` (build.edit). The version is the one the edit
 * started from; if someone saved in between the answer is 409 and nothing is written.
 */
export async function PATCH(incoming: Request, { params }: BuildParams): Promise<Response> {
  return guarded(incoming, {}, async (request) => {
    const { workspace, id } = await params;
    const access = await requireAction(workspace, 'build.edit');
    const buildId = parsePathId(id);
    if (!buildId) return jsonError(404, NOT_FOUND_MESSAGE);
    const body = await parseJsonBody(request, buildPatchSchema);
    if (!body.ok) return body.response;
    const { version, ...changes } = body.data;
    const user = { id: access.user.id, mayChangeHandedOver: can(access.role, 'build.reopen-handed-over') };
    return saveResponse(await updateBuild(access.workspace.id, buildId, user, version, changes));
  });
}

/** DELETE …/builds/[id] — build.delete: removes the record, its history, its sends and its photo files. */
export async function DELETE(incoming: Request, { params }: BuildParams): Promise<Response> {
  return guarded(incoming, {}, async () => {
    const { workspace, id } = await params;
    const access = await requireAction(workspace, 'build.delete');
    const buildId = parsePathId(id);
    const keys = buildId ? await deleteBuild(access.workspace.id, buildId) : null;
    if (!keys) return jsonError(404, NOT_FOUND_MESSAGE);
    await Promise.all(keys.map(deleteObject));
    return new Response(null, { status: 204 });
  });
}
