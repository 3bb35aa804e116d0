import { parseJsonBody } from '@/app/lib/api';
import { appOrigin } from '@/app/lib/app-origin';
import { requireAction } from '@/app/lib/authz';
import { guarded } from '@/app/lib/route-handler';
import { serviceResponse } from '@/app/lib/service-response';
import { invite } from '@/app/lib/workspace-service';
import { pendingInvitations } from '@/db/invitations';
import { inviteSchema } from '@/lib/account-forms';
import { dateFormatOf } from '@/app/lib/date-format';

type Context = { params: Promise<{ workspace: string }> };

/** GET: pending invitations (invitations.manage). */
export async function GET(_request: Request, { params }: Context) {
  return guarded(async () => {
    const access = await requireAction((await params).workspace, 'invitations.manage');
    return Response.json(await pendingInvitations(access.workspace.id));
  });
}

/** POST { email, role }: invitations.manage: invite someone by e-mail; the link is single-use and expires in 7 days. */
export async function POST(incoming: Request, { params }: Context) {
  return guarded(incoming, {}, async (request) => {
    const access = await requireAction((await params).workspace, 'invitations.manage');
    const parsed = await parseJsonBody(request, inviteSchema);
    if (!parsed.ok) return parsed.response;
    return serviceResponse(await invite(access, parsed.data, appOrigin(request), dateFormatOf(request)), 201);
  });
}
