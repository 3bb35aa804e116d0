import { sendVerification } from '@/app/lib/account-service';
import { jsonError } from '@/app/lib/api';
import { appOrigin } from '@/app/lib/app-origin';
import { requireUser } from '@/app/lib/authz';
import { clientAddress } from '@/app/lib/client-address';
import { RateLimitedError } from '@/app/lib/rate-limit';
import { guarded } from '@/app/lib/route-handler';

/** POST: mails the signed-in user a new confirmation link (nothing if already confirmed); 3 an hour per address and account. */
export async function POST(incoming: Request) {
  return guarded(incoming, {}, async (request) => {
    const user = await requireUser();
    try {
      await sendVerification(user.id, appOrigin(request), clientAddress(request.headers));
    } catch (err) {
      if (err instanceof RateLimitedError) return jsonError(429, err.message);
      throw err;
    }
    return Response.json({ sent: true }, { status: 202 });
  });
}
