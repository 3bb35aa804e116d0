import 'server-only';
import { createHash, randomBytes } from 'node:crypto';

/** A fresh random token for a link, and the SHA-256 that is all the database keeps of it. */
export function newToken(): { token: string; tokenHash: string } {
  const token = randomBytes(32).toString('base64url');
  return { token, tokenHash: hashToken(token) };
}

export function hashToken(token: string): string {
  return createHash('sha256').update(token).digest('hex');
}

export const TOKEN_LIFETIME_MS = {
  'verify-email': 24 * 60 * 60 * 1000,
  'reset-password': 60 * 60 * 1000,
  invitation: 7 * 24 * 60 * 60 * 1000,
} as const;

export type TokenRefusal = 'unknown' | 'used' | 'expired';

/** Clear words for a refused link; a forged token reads like one that never existed. */
export const TOKEN_REFUSAL_MESSAGES: Record<TokenRefusal, string> = {
  unknown: 'This link is not valid. Check that you opened the whole link from the e-mail, or ask for a new one.',
  used: 'This link has already been used, and each link works only once. Ask for a new one if you still need it.',
  expired: 'This link has expired. Ask for a new one.',
};

export function expiresAt(kind: keyof typeof TOKEN_LIFETIME_MS, now = Date.now()): string {
  return new Date(now + TOKEN_LIFETIME_MS[kind]).toISOString();
}

export function isExpired(expiresAtIso: string, now = Date.now()): boolean {
  return Date.parse(expiresAtIso) <= now;
}
