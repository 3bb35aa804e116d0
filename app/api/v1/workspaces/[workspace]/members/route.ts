import { requireAction } from '@/app/lib/authz';
import { guarded } from '@/app/lib/route-handler';
import { membersOf } from '@/db/accounts';

type Context = { params: Promise<{ workspace: string }> };

/** GET: the members of the workspace with their roles (members.read). */
export async function GET(_request: Request, { params }: Context) {
  return guarded(async () => {
    const access = await requireAction((await params).workspace, 'members.read');
    return Response.json(await membersOf(access.workspace.id));
  });
}
