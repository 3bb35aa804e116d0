import { createRequire } from 'node:module';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { isSessionCookieName } from '@/lib/session-cookie';

// next-auth's own cookie table is the independent source of the names it writes (not in its exports map).
type CookieTable = Record<'sessionToken' | 'csrfToken' | 'callbackUrl', { name: string }>;
const { defaultCookies } = createRequire(import.meta.url)(
  path.join(process.cwd(), 'node_modules/next-auth/core/lib/cookie.js'),
) as { defaultCookies: (secure: boolean) => CookieTable };

describe('isSessionCookieName', () => {
  it('knows the session cookie next-auth writes over http and https, and its chunks', () => {
    for (const secure of [false, true]) {
      const names = defaultCookies(secure);
      expect(isSessionCookieName(names.sessionToken.name), names.sessionToken.name).toBe(true);
      expect(isSessionCookieName(`${names.sessionToken.name}.1`)).toBe(true);
      // The CSRF and callback cookies exist before anyone signs in: they must not count.
      expect(isSessionCookieName(names.csrfToken.name)).toBe(false);
      expect(isSessionCookieName(names.callbackUrl.name)).toBe(false);
    }
  });

  it('does not take look-alikes', () => {
    expect(isSessionCookieName('x-next-auth.session-token')).toBe(false);
    expect(isSessionCookieName('next-auth.session-token.x')).toBe(false);
  });
});
