/** How long each kind of mailed link stays valid, and the words for one that is refused. */
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
