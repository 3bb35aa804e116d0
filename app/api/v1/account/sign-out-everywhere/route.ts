import { endSessions } from '@/app/lib/account-service';
import { requireUser } from '@/app/lib/authz';
import { guarded } from '@/app/lib/route-handler';

/** POST: ends every session of the signed-in user, on every device (this one too). */
export async function POST(incoming: Request) {
  return guarded(incoming, {}, async () => {
    const user = await requireUser();
    await endSessions(user.id);
    return Response.json({ signedOut: true });
  });
}
