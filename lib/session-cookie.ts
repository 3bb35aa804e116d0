/** next-auth's session cookie, plain or `__Secure-` prefixed (https), possibly split into `.0`, `.1`… chunks. */
const SESSION_COOKIE = /^(__Secure-)?next-auth\.session-token(\.\d+)?$/;

export function isSessionCookieName(name: string): boolean {
  return SESSION_COOKIE.test(name);
}
