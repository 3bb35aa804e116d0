import { requireRole } from '@/app/lib/authz';
import { guarded } from '@/app/lib/route-handler';
import { membersOf } from '@/db/accounts';

type Context = { params: Promise<{ workspace: string }> };

/** GET: the members of the workspace with their roles (viewer and up). */
export async function GET(_request: Request, { params }: Context) {
  return guarded(async () => {
    const access = await requireRole((await params).workspace, 'viewer');
    return Response.json(await membersOf(access.workspace.id));
  });
}
