import { sendVerification } from '@/app/lib/account-service';
import { appOrigin } from '@/app/lib/app-origin';
import { requireUser } from '@/app/lib/authz';
import { guarded } from '@/app/lib/route-handler';

/** POST: mails the signed-in user a new confirmation link (nothing if already confirmed). */
export async function POST(incoming: Request) {
  return guarded(incoming, {}, async (request) => {
    const user = await requireUser();
    await sendVerification(user.id, appOrigin(request));
    return Response.json({ sent: true }, { status: 202 });
  });
}
