import { parseJsonBody } from '@/app/lib/api';
import { requireAction } from '@/app/lib/authz';
import { guarded } from '@/app/lib/route-handler';
import { renameWorkspace } from '@/app/lib/workspace-service';
import { createShopSchema } from '@/lib/account-forms';

type Context = { params: Promise<{ workspace: string }> };

/** GET: the workspace and the caller's role (anyone who may read it). */
export async function GET(_request: Request, { params }: Context) {
  return guarded(async () => {
    const access = await requireAction((await params).workspace, 'workspace.read');
    return Response.json({ workspace: access.workspace, role: access.role });
  });
}

/** PATCH { name }: those who may change its settings rename the workspace (its settings). */
export async function PATCH(incoming: Request, { params }: Context) {
  return guarded(incoming, {}, async (request) => {
    const access = await requireAction((await params).workspace, 'workspace.settings');
    const parsed = await parseJsonBody(request, createShopSchema);
    if (!parsed.ok) return parsed.response;
    await renameWorkspace(access, parsed.data.name);
    return Response.json({ workspace: { ...access.workspace, name: parsed.data.name } });
  });
}
