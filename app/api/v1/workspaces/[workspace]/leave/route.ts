import { requireRole } from '@/app/lib/authz';
import { guarded } from '@/app/lib/route-handler';
import { serviceResponse } from '@/app/lib/service-response';
import { removeMember } from '@/app/lib/workspace-service';

type Context = { params: Promise<{ workspace: string }> };

/** POST: any member leaves the workspace, unless they are its last owner. */
export async function POST(_request: Request, { params }: Context) {
  return guarded(async () => {
    const access = await requireRole((await params).workspace, 'viewer');
    return serviceResponse(await removeMember(access, access.user.id, true), 204);
  });
}
