import { parseJsonBody } from '@/app/lib/api';
import { requireUser } from '@/app/lib/authz';
import { guarded } from '@/app/lib/route-handler';
import { serviceResponse } from '@/app/lib/service-response';
import { acceptInvitationFor } from '@/app/lib/workspace-service';
import { tokenSchema } from '@/lib/account-forms';

/** POST { token }: the signed-in invitee joins the workspace with the invited role. */
export async function POST(incoming: Request) {
  return guarded(incoming, {}, async (request) => {
    const user = await requireUser();
    const parsed = await parseJsonBody(request, tokenSchema);
    if (!parsed.ok) return parsed.response;
    return serviceResponse(await acceptInvitationFor(user.id, parsed.data.token));
  });
}
