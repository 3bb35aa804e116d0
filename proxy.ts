import { withAuth, type NextRequestWithAuth } from 'next-auth/middleware';
import { NextResponse, type NextFetchEvent, type NextRequest } from 'next/server';
import { authSecret } from '@/app/lib/auth-secret';
import { sessionCookieName } from '@/lib/session-cookie';
import { contentSecurityPolicy } from '@/lib/content-security-policy';
import { PAGE_PATH_HEADER } from '@/app/lib/page-path-header';

const PRIVATE_PATHS = [/^\/w(\/|$)/, /^\/account(\/|$)/];

/**
 * Gives every page a Content-Security-Policy with a fresh nonce (on the request too, where
 * Next reads it to mark its inline scripts) and the page's path (for app/forbidden.tsx), and sends signed-out visitors of private pages to
 * /sign-in. It grants nothing: every page, route handler and server action checks the session
 * and role itself.
 */
function withPolicy(request: NextRequest): NextResponse {
  const nonce = Buffer.from(crypto.randomUUID()).toString('base64');
  const policy = contentSecurityPolicy(nonce, process.env.NODE_ENV === 'development');
  const headers = new Headers(request.headers);
  headers.set('x-nonce', nonce);
  headers.set('Content-Security-Policy', policy);
  // Whatever a client sent under this name is replaced: the 403 page reads it to say what was refused.
  headers.set(PAGE_PATH_HEADER, request.nextUrl.pathname);
  const response = NextResponse.next({ request: { headers } });
  response.headers.set('Content-Security-Policy', policy);
  return response;
}

const signedInOnly = withAuth((request) => withPolicy(request), {
  pages: { signIn: '/sign-in' },
  cookies: { sessionToken: { name: sessionCookieName() } },
  get secret() {
    return authSecret();
  },
});

export default function proxy(request: NextRequest, event: NextFetchEvent) {
  if (PRIVATE_PATHS.some((path) => path.test(request.nextUrl.pathname))) return signedInOnly(request as NextRequestWithAuth, event);
  return withPolicy(request);
}

export const config = {
  // Pages only: route handlers answer JSON and files (and are not slowed or buffered by the proxy).
  matcher: [
    {
      source: '/((?!api/|_next/static|_next/image|favicon.ico).*)',
      missing: [
        { type: 'header', key: 'next-router-prefetch' },
        { type: 'header', key: 'purpose', value: 'prefetch' },
      ],
    },
  ],
};
