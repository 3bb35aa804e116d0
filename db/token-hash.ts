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
