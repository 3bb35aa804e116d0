import { withAuth } from 'next-auth/middleware';
import { authSecret } from '@/app/lib/auth-secret';

/**
 * Only sends signed-out visitors of private pages to /sign-in. It grants nothing:
 * every page, route handler and server action checks the session and role itself.
 */
export default withAuth({
  pages: { signIn: '/sign-in' },
  get secret() {
    return authSecret();
  },
});

export const config = { matcher: ['/w/:path*', '/account/:path*', '/account'] };
