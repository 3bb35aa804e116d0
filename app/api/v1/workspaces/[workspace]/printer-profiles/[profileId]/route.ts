import { jsonError } from '@/app/lib/api';
import { requireAction } from '@/app/lib/authz';
import { guarded } from '@/app/lib/route-handler';
import { deleteProfile } from '@/db/printer-profiles';
import { parsePathId } from '@/lib/path-id';

type Context = { params: Promise<{ workspace: string; profileId: string }> };

/** DELETE: members who may edit printer profiles remove a profile of their workspace. */
export async function DELETE(incoming: Request, { params }: Context) {
  return guarded(incoming, {}, async () => {
    const { workspace, profileId } = await params;
    const access = await requireAction(workspace, 'printer-profile.edit');
    const id = parsePathId(profileId);
    if (id === null || !(await deleteProfile(access.workspace.id, id))) {
      return jsonError(404, 'No such printer profile in this workspace');
    }
    return new Response(null, { status: 204 });
  });
}
