import 'server-only';
import { jsonError } from '@/app/lib/api';
import { AccessError, NOT_FOUND_MESSAGE, requireAction, type Access } from '@/app/lib/authz';
import { findBuild } from '@/db/builds/find-build';
import type { SaveOutcome } from '@/db/builds/save-outcome';
import type { Action } from '@/lib/access-policy';
import type { Build } from '@/lib/builds/build';
import { parsePathId } from '@/lib/path-id';

export type WorkspaceParams = { params: Promise<{ workspace: string }> };
export type BuildParams = { params: Promise<{ workspace: string; id: string }> };

/**
 * The record named by the path, for a caller whose role may do `action` in its workspace.
 * A bad id or a record of another workspace throws the same 404 as a missing workspace.
 */
export async function buildFor(params: BuildParams['params'], action: Action): Promise<{ access: Access; build: Build }> {
  const { workspace, id } = await params;
  const access = await requireAction(workspace, action);
  const buildId = parsePathId(id);
  const build = buildId ? await findBuild(access.workspace.id, buildId) : null;
  if (!build) throw new AccessError(404, NOT_FOUND_MESSAGE);
  return { access, build };
}

/** "changed by X at T — reload": a stale save never overwrites; the caller gets the current state back. */
function conflictResponse(current: Build): Response {
  const who = current.updatedBy?.name || 'someone';
  const error = `This build record was changed by ${who} at ${current.updatedAt} (now version ${current.version}) — reload to see the changes, then apply yours again`;
  return Response.json({ error, issues: [{ path: 'version', message: error }], current }, { status: 409 });
}

export function saveResponse(outcome: SaveOutcome, created?: { location: string }): Response {
  if (outcome.ok)
    return created
      ? Response.json({ build: outcome.build }, { status: 201, headers: { Location: created.location } })
      : Response.json({ build: outcome.build, changed: outcome.changed });
  if (outcome.reason === 'not-found') return jsonError(404, NOT_FOUND_MESSAGE);
  if (outcome.reason === 'conflict') return conflictResponse(outcome.current);
  if (outcome.reason === 'forbidden') return jsonError(403, outcome.message, [{ path: 'status', message: outcome.message }]);
  return jsonError(400, 'Some fields are not valid', outcome.issues);
}
