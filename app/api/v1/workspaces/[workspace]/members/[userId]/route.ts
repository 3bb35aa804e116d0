import { jsonError, parseJsonBody } from '@/app/lib/api';
import { requireAction } from '@/app/lib/authz';
import { guarded } from '@/app/lib/route-handler';
import { serviceResponse } from '@/app/lib/service-response';
import { parsePathId } from '@/lib/path-id';
import { changeRole, removeMember } from '@/app/lib/workspace-service';
import { roleChangeSchema } from '@/lib/account-forms';

type Context = { params: Promise<{ workspace: string; userId: string }> };

const NO_MEMBER = 'No such member in this workspace';

/** PATCH { role }: members.manage changes a member's role; the last owner cannot be demoted. */
export async function PATCH(incoming: Request, { params }: Context) {
  return guarded(incoming, {}, async (request) => {
    const { workspace, userId } = await params;
    const access = await requireAction(workspace, 'members.manage');
    const target = parsePathId(userId);
    if (target === null) return jsonError(404, NO_MEMBER);
    const parsed = await parseJsonBody(request, roleChangeSchema);
    if (!parsed.ok) return parsed.response;
    return serviceResponse(await changeRole(access, target, parsed.data.role));
  });
}

/** DELETE: members.manage removes a member; the last owner cannot be removed. */
export async function DELETE(incoming: Request, { params }: Context) {
  return guarded(incoming, {}, async () => {
    const { workspace, userId } = await params;
    const access = await requireAction(workspace, 'members.manage');
    const target = parsePathId(userId);
    if (target === null) return jsonError(404, NO_MEMBER);
    return serviceResponse(await removeMember(access, target), 204);
  });
}
