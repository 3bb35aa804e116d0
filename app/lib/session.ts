import 'server-only';
import { getServerSession } from 'next-auth';
import { cookies } from 'next/headers';
import { findUserById } from '@/db/accounts';
import { isSessionCookieName } from '@/lib/session-cookie';
import { authOptions } from './auth-options';

/**
 * The signed-in user's id from the next-auth JWT, or null. The one place the app reads
 * the session, so tests replace this module (tests/support/session.ts) to act as anyone.
 * Without a session cookie next-auth is not consulted at all: that keeps visitors' pages
 * (and the build's prerendering, which has no cookies) free of the signing key.
 */
export async function sessionUserId(): Promise<number | null> {
  const jar = await cookies();
  if (!jar.getAll().some((c) => isSessionCookieName(c.name))) return null;
  const session = await getServerSession(authOptions);
  const id = Number(session?.user?.id);
  if (!Number.isInteger(id) || id <= 0) return null;
  const user = await findUserById(id);
  // A password reset raises the version: sessions signed before it read as signed out.
  return user && user.session_version === session?.user?.sessionVersion ? id : null;
}
