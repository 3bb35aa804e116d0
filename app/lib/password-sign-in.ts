import 'server-only';
import { recordAudit } from '@/db/audit-log';
import { findUserByEmail, normalizeEmail } from '@/db/accounts';
import { signInSchema } from '@/lib/account-forms';
import { passwordMatches } from './passwords';
import { assertNotLimited, consumePoint, forgetKey, RateLimitedError } from './rate-limit';

export type SignedInUser = { id: string; email: string; name: string; sessionVersion: number };

/** The error code next-auth passes to /sign-in when the limiter refuses an attempt. */
export const RATE_LIMITED_CODE = 'RateLimited';

/**
 * The Credentials provider's check. Returns null for every kind of refusal (unknown
 * address, wrong password, malformed input) so the sign-in page cannot tell them apart;
 * throws only when the limiter refuses, which the page reports as "too many attempts".
 */
export async function signInWithPassword(credentials: unknown, address: string): Promise<SignedInUser | null> {
  const parsed = signInSchema.safeParse(credentials);
  if (!parsed.success) return null;
  const email = normalizeEmail(parsed.data.email);
  const keys: Parameters<typeof consumePoint>[0] = [
    ['signInPerAccountAndAddress', `${email} ${address}`],
    ['signInPerAddress', address],
    ['signInPerAccount', email],
  ];
  try {
    await assertNotLimited(keys);
  } catch (err) {
    if (err instanceof RateLimitedError) throw new Error(RATE_LIMITED_CODE);
    throw err;
  }
  const user = await findUserByEmail(email);
  if (!(await passwordMatches(parsed.data.password, user?.password_hash))) {
    await consumePoint(keys).catch(() => undefined);
    // Written for unknown addresses too, so both refusals cost the same work.
    await recordAudit({ action: 'sign-in-refused', actorUserId: user?.id ?? null, detail: { address } });
    return null;
  }
  // The right password from here clears this address's count for the account; the others stand.
  await forgetKey('signInPerAccountAndAddress', `${email} ${address}`);
  await recordAudit({ action: 'sign-in', actorUserId: user!.id, detail: { address } });
  return { id: String(user!.id), email: user!.email, name: user!.name, sessionVersion: user!.session_version };
}
