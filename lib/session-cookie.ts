/** next-auth's session cookie, plain or `__Secure-` prefixed (https), possibly split into `.0`, `.1`… chunks. */
const SESSION_COOKIE = /^(__Secure-)?next-auth\.session-token(\.\d+)?$/;

export function isSessionCookieName(name: string): boolean {
  return SESSION_COOKIE.test(name);
}

/** Cookies are `Secure` (and so `__Secure-` named) when the app's public origin, APP_URL, is https. */
export function secureCookies(): boolean {
  return (process.env.APP_URL || process.env.NEXTAUTH_URL || '').startsWith('https://');
}

export function sessionCookieName(): string {
  return `${secureCookies() ? '__Secure-' : ''}next-auth.session-token`;
}
