import { parseJsonBody } from '@/app/lib/api';
import { requireRole } from '@/app/lib/authz';
import { guarded } from '@/app/lib/route-handler';
import { renameWorkspace } from '@/app/lib/workspace-service';
import { createShopSchema } from '@/lib/account-forms';

type Context = { params: Promise<{ workspace: string }> };

/** GET: the workspace and the caller's role (viewer and up). */
export async function GET(_request: Request, { params }: Context) {
  return guarded(async () => {
    const access = await requireRole((await params).workspace, 'viewer');
    return Response.json({ workspace: access.workspace, role: access.role });
  });
}

/** PATCH { name }: owners rename the workspace (its settings). */
export async function PATCH(request: Request, { params }: Context) {
  return guarded(async () => {
    const access = await requireRole((await params).workspace, 'owner');
    const parsed = await parseJsonBody(request, createShopSchema);
    if (!parsed.ok) return parsed.response;
    await renameWorkspace(access, parsed.data.name);
    return Response.json({ workspace: { ...access.workspace, name: parsed.data.name } });
  });
}
