import 'server-only';
import { getServerSession } from 'next-auth';
import { authOptions } from './auth-options';

/**
 * The signed-in user's id from the next-auth JWT, or null. The one place the app reads
 * the session, so tests replace this module (tests/support/session.ts) to act as anyone.
 */
export async function sessionUserId(): Promise<number | null> {
  const session = await getServerSession(authOptions);
  const id = Number(session?.user?.id);
  return Number.isInteger(id) && id > 0 ? id : null;
}
