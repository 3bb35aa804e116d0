import { jsonError } from '@/app/lib/api';
import { requireAction } from '@/app/lib/authz';
import { guarded } from '@/app/lib/route-handler';
import { revokeInvitation } from '@/db/invitations';
import { parsePathId } from '@/lib/path-id';

type Context = { params: Promise<{ workspace: string; invitationId: string }> };

/** DELETE: invitations.manage: withdraw a pending invitation; its link stops working. */
export async function DELETE(incoming: Request, { params }: Context) {
  return guarded(incoming, {}, async () => {
    const { workspace, invitationId } = await params;
    const access = await requireAction(workspace, 'invitations.manage');
    const id = parsePathId(invitationId);
    if (id === null || !(await revokeInvitation(access.workspace.id, id))) {
      return jsonError(404, 'No such pending invitation in this workspace');
    }
    return new Response(null, { status: 204 });
  });
}
