import 'server-only';
import { randomBytes } from 'node:crypto';
import { recordAudit } from '@/db/audit-log';
import { createWorkspace, findUserByEmail, findUserById, normalizeEmail, slugFrom } from '@/db/accounts';
import { db } from '@/db/knex';
import { consumeToken, issueToken, retireTokens } from '@/db/one-time-tokens';
import { lookUpInvitation } from '@/db/invitations';
import { TABLES } from '@/db/tables';
import type { SignUpInput } from '@/lib/account-forms';
import { resetMail, verificationMail } from './emails';
import { sendMail } from './mailer';
import { TOKEN_REFUSAL_MESSAGES } from '@/lib/one-time-token';
import { hashPassword } from './passwords';
import { consumePoint, RateLimitedError } from './rate-limit';

export type ServiceResult<T> = { ok: true; value: T } | { ok: false; status: number; message: string };

const refuse = (status: number, message: string) => ({ ok: false, status, message }) as const;

export function randomSlugTail(): string {
  return randomBytes(3).toString('hex');
}

/** Creates the account with its personal workspace; mails a confirmation link unless an invitation proves the address. */
export async function signUp(input: SignUpInput, origin: string, client: string): Promise<ServiceResult<{ userId: number; verified: boolean }>> {
  const email = normalizeEmail(input.email);
  if (await findUserByEmail(email)) {
    return refuse(409, 'An account with this e-mail already exists: sign in, or reset its password');
  }
  let verified = false;
  if (input.invitationToken) {
    const looked = await lookUpInvitation(input.invitationToken);
    verified = looked.ok && looked.invitation.email === email;
  }
  const knex = db();
  const [row] = await knex(TABLES.users)
    .insert({
      email,
      name: input.name,
      password_hash: await hashPassword(input.password),
      email_verified_at: verified ? new Date().toISOString() : null,
    })
    .returning('id');
  const userId: number = row.id;
  await createWorkspace({ name: `${input.name}’s workspace`, kind: 'personal', ownerId: userId, slug: slugFrom(input.name, randomSlugTail()) });
  await recordAudit({ action: 'sign-up', actorUserId: userId });
  if (!verified) {
    // The account stands even if the mail server is down; the account page offers a new link.
    await sendVerification(userId, origin, client).catch((err: unknown) => console.error(`[mail] confirmation link not sent: ${errorText(err)}`));
  }
  return { ok: true, value: { userId, verified } };
}

/**
 * Mails a confirmation link to the account's (unconfirmed) address. Whoever signs up may have
 * typed somebody else's address, so these mails are limited per target address, per account
 * and per client (RateLimitedError).
 */
export async function sendVerification(userId: number, origin: string, client: string): Promise<void> {
  const user = await findUserById(userId);
  if (!user || user.email_verified_at) return;
  await consumePoint([
    ['verifyMailPerTarget', user.email],
    ['verifyMailPerAccount', String(user.id)],
    ['verifyMailPerAddress', client],
  ]);
  const token = await issueToken('verify-email', userId);
  await sendMail(verificationMail(user.email, user.name, `${origin}/verify-email?token=${token}`));
}

export async function verifyEmail(token: string): Promise<ServiceResult<{ userId: number }>> {
  const used = await consumeToken('verify-email', token);
  if (!used.ok) return refuse(400, TOKEN_REFUSAL_MESSAGES[used.reason]);
  await db()(TABLES.users).where({ id: used.userId }).update({ email_verified_at: new Date().toISOString() });
  await recordAudit({ action: 'email-verified', actorUserId: used.userId });
  return { ok: true, value: { userId: used.userId } };
}

/** Mails a reset link if the address has an account; the caller answers the same either way. */
export async function requestPasswordReset(email: string, origin: string): Promise<void> {
  const user = await findUserByEmail(email);
  if (!user) return;
  try {
    await consumePoint([['resetPerAccount', String(user.id)]]);
  } catch (err) {
    // Answered like any other request: the reply must not tell whether the address has an account.
    if (err instanceof RateLimitedError) return;
    throw err;
  }
  const token = await issueToken('reset-password', user.id);
  // A mail failure is logged, not answered: the reply must not differ for addresses with an account.
  await sendMail(resetMail(user.email, `${origin}/reset-password/confirm?token=${token}`)).catch((err: unknown) =>
    console.error(`[mail] reset link not sent: ${errorText(err)}`),
  );
}

export function errorText(err: unknown): string {
  return err instanceof Error ? err.message : String(err);
}

export async function resetPassword(token: string, password: string): Promise<ServiceResult<{ userId: number }>> {
  const used = await consumeToken('reset-password', token);
  if (!used.ok) return refuse(400, TOKEN_REFUSAL_MESSAGES[used.reason]);
  // The mailbox has just been proven, so the address counts as verified too.
  const now = new Date().toISOString();
  await db()(TABLES.users)
    .where({ id: used.userId })
    .update({
      password_hash: await hashPassword(password),
      email_verified_at: db().raw('coalesce(email_verified_at, ?)', [now]),
      // Signs the account out everywhere: sessions made with the old password stop working.
      session_version: db().raw('session_version + 1'),
    });
  await retireTokens('reset-password', used.userId);
  await recordAudit({ action: 'password-reset', actorUserId: used.userId });
  return { ok: true, value: { userId: used.userId } };
}

/**
 * Ends every session of the user: sessions carry the version they were signed in at, and
 * app/lib/session.ts reads one that no longer matches as signed out, so a saved cookie stops
 * working at once. With `fromVersion` (a sign-out's own token) only a current session raises
 * it, so replaying an already dead cookie cannot end newer sessions.
 */
export async function endSessions(userId: number, fromVersion?: number): Promise<boolean> {
  const query = db()(TABLES.users).where({ id: userId });
  if (fromVersion !== undefined) query.andWhere({ session_version: fromVersion });
  const changed = await query.update({ session_version: db().raw('session_version + 1') });
  if (changed > 0) await recordAudit({ action: 'signed-out', actorUserId: userId, detail: { everywhere: fromVersion === undefined ? 1 : 0 } });
  return changed > 0;
}
