import { resetPassword } from '@/app/lib/account-service';
import { parseJsonBody } from '@/app/lib/api';
import { serviceResponse } from '@/app/lib/service-response';
import { resetPasswordSchema } from '@/lib/account-forms';
import { guarded } from '@/app/lib/route-handler';

/** POST { token, password }: sets a new password through a mailed link (once, within the hour). */
export async function POST(incoming: Request) {
  return guarded(incoming, {}, async (request) => {
    const parsed = await parseJsonBody(request, resetPasswordSchema);
    if (!parsed.ok) return parsed.response;
    return serviceResponse(await resetPassword(parsed.data.token, parsed.data.password), 200, () => ({ reset: true }));
  });
}
