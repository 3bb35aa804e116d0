import { parseJsonBody } from '@/app/lib/api';
import { requireAction } from '@/app/lib/authz';
import { guarded } from '@/app/lib/route-handler';
import { setWorkspaceToleranceDeg, workspaceToleranceDeg } from '@/db/builds/references';
import { db } from '@/db/knex';
import { buildSettingsSchema } from '@/lib/builds/build-settings';

type Context = { params: Promise<{ workspace: string }> };

/** GET: the workspace's build settings (build.read: the record pages show the tolerance). */
export async function GET(_request: Request, { params }: Context) {
  return guarded(async () => {
    const access = await requireAction((await params).workspace, 'build.read');
    return Response.json({ settings: { toleranceDeg: await workspaceToleranceDeg(db(), access.workspace.id) } });
  });
}

/**
 * PUT { toleranceDeg }: those who may change the workspace's settings set the port duration tolerance.
 * Records keep the tolerance they were judged with until they are saved again.
 */
export async function PUT(incoming: Request, { params }: Context) {
  return guarded(incoming, {}, async (request) => {
    const access = await requireAction((await params).workspace, 'workspace.settings');
    const parsed = await parseJsonBody(request, buildSettingsSchema);
    if (!parsed.ok) return parsed.response;
    await setWorkspaceToleranceDeg(db(), access.workspace.id, parsed.data.toleranceDeg);
    return Response.json({ settings: parsed.data });
  });
}
