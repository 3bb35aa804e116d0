import { requestPasswordReset } from '@/app/lib/account-service';
import { jsonError, parseJsonBody } from '@/app/lib/api';
import { appOrigin } from '@/app/lib/app-origin';
import { clientAddress } from '@/app/lib/client-address';
import { consumePoint, RateLimitedError } from '@/app/lib/rate-limit';
import { normalizeEmail } from '@/db/accounts';
import { emailOnlySchema } from '@/lib/account-forms';
import { guarded } from '@/app/lib/route-handler';

export const RESET_REQUESTED_MESSAGE =
  'If an account uses this address, we have sent it a link to choose a new password. It is valid for 1 hour.';

/** POST { email }: answers the same whether or not the address has an account; rate-limited. */
export async function POST(incoming: Request) {
  return guarded(incoming, {}, async (request) => {
    const parsed = await parseJsonBody(request, emailOnlySchema);
    if (!parsed.ok) return parsed.response;
    const email = normalizeEmail(parsed.data.email);
    try {
      await consumePoint([
        ['resetPerAddress', clientAddress(request.headers)],
        ['resetPerTarget', email],
      ]);
    } catch (err) {
      if (err instanceof RateLimitedError) {
        return jsonError(429, err.message);
      }
      throw err;
    }
    await requestPasswordReset(email, appOrigin(request));
    return Response.json({ message: RESET_REQUESTED_MESSAGE }, { status: 202 });
  });
}
