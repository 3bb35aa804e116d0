import { parseJsonBody } from '@/app/lib/api';
import { appOrigin } from '@/app/lib/app-origin';
import { requireRole } from '@/app/lib/authz';
import { guarded } from '@/app/lib/route-handler';
import { serviceResponse } from '@/app/lib/service-response';
import { invite } from '@/app/lib/workspace-service';
import { pendingInvitations } from '@/db/invitations';
import { inviteSchema } from '@/lib/account-forms';

type Context = { params: Promise<{ workspace: string }> };

/** GET: pending invitations (owners). */
export async function GET(_request: Request, { params }: Context) {
  return guarded(async () => {
    const access = await requireRole((await params).workspace, 'owner');
    return Response.json(await pendingInvitations(access.workspace.id));
  });
}

/** POST { email, role }: owners invite someone by e-mail; the link is single-use and expires in 7 days. */
export async function POST(request: Request, { params }: Context) {
  return guarded(async () => {
    const access = await requireRole((await params).workspace, 'owner');
    const parsed = await parseJsonBody(request, inviteSchema);
    if (!parsed.ok) return parsed.response;
    return serviceResponse(await invite(access, parsed.data, appOrigin(request)), 201);
  });
}
