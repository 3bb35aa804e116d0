import 'server-only';
import type { Knex } from 'knex';
import { expiresAt, isExpired, type TokenRefusal } from '@/lib/one-time-token';
import { hashToken, newToken } from './token-hash';
import { db } from './knex';
import { TABLES } from './tables';

export type TokenPurpose = 'verify-email' | 'reset-password';

/** Stores the hash of a new token for the user and returns the token for the link. */
export async function issueToken(purpose: TokenPurpose, userId: number, knex: Knex = db()): Promise<string> {
  const { token, tokenHash } = newToken();
  await knex(TABLES.oneTimeTokens).insert({ purpose, user_id: userId, token_hash: tokenHash, expires_at: expiresAt(purpose) });
  return token;
}

export type Consumed = { ok: true; userId: number } | { ok: false; reason: TokenRefusal };

/** Uses the token up (once only, even under concurrent requests) if it is known, unused and unexpired. */
export async function consumeToken(purpose: TokenPurpose, token: string, knex: Knex = db()): Promise<Consumed> {
  const row = await knex(TABLES.oneTimeTokens).where({ purpose, token_hash: hashToken(token) }).first();
  if (!row) return { ok: false, reason: 'unknown' };
  if (row.used_at) return { ok: false, reason: 'used' };
  if (isExpired(row.expires_at)) return { ok: false, reason: 'expired' };
  const updated = await knex(TABLES.oneTimeTokens)
    .where({ id: row.id })
    .whereNull('used_at')
    .update({ used_at: new Date().toISOString() });
  return updated === 1 ? { ok: true, userId: row.user_id } : { ok: false, reason: 'used' };
}

/** After a password reset, no older reset link of the user may be used. */
export async function retireTokens(purpose: TokenPurpose, userId: number, knex: Knex = db()): Promise<void> {
  await knex(TABLES.oneTimeTokens)
    .where({ purpose, user_id: userId })
    .whereNull('used_at')
    .update({ used_at: new Date().toISOString() });
}
