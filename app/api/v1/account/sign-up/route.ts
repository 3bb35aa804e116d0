import { signUp } from '@/app/lib/account-service';
import { jsonError, parseJsonBody } from '@/app/lib/api';
import { appOrigin } from '@/app/lib/app-origin';
import { clientAddress } from '@/app/lib/client-address';
import { consumePoint, RateLimitedError } from '@/app/lib/rate-limit';
import { serviceResponse } from '@/app/lib/service-response';
import { signUpSchema } from '@/lib/account-forms';
import { guarded } from '@/app/lib/route-handler';

/** POST: create an account (open to anyone, 20 an hour per client address) with its personal workspace. */
export async function POST(incoming: Request) {
  return guarded(incoming, {}, async (request) => {
    const parsed = await parseJsonBody(request, signUpSchema);
    if (!parsed.ok) return parsed.response;
    const client = clientAddress(request.headers);
    try {
      await consumePoint([['signUpPerAddress', client]]);
    } catch (err) {
      if (err instanceof RateLimitedError) return jsonError(429, err.message);
      throw err;
    }
    const result = await signUp(parsed.data, appOrigin(request), client);
    return serviceResponse(result, 201);
  });
}
