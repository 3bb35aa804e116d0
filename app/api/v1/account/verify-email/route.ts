import { verifyEmail } from '@/app/lib/account-service';
import { parseJsonBody } from '@/app/lib/api';
import { serviceResponse } from '@/app/lib/service-response';
import { tokenSchema } from '@/lib/account-forms';
import { guarded } from '@/app/lib/route-handler';

/** POST { token }: confirms the address the link was mailed to. The token is the only credential. */
export async function POST(incoming: Request) {
  return guarded(incoming, {}, async (request) => {
    const parsed = await parseJsonBody(request, tokenSchema);
    if (!parsed.ok) return parsed.response;
    return serviceResponse(await verifyEmail(parsed.data.token), 200, () => ({ verified: true }));
  });
}
