import { requireAction } from '@/app/lib/authz';
import { guarded } from '@/app/lib/route-handler';
import { serviceResponse } from '@/app/lib/service-response';
import { removeMember } from '@/app/lib/workspace-service';

type Context = { params: Promise<{ workspace: string }> };

/** POST: any member leaves the workspace, unless they are the last holder of the workspace. */
export async function POST(incoming: Request, { params }: Context) {
  return guarded(incoming, {}, async () => {
    const access = await requireAction((await params).workspace, 'workspace.leave');
    return serviceResponse(await removeMember(access, access.user.id, true), 204);
  });
}
