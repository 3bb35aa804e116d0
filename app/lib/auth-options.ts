import 'server-only';
import type { NextAuthOptions } from 'next-auth';
import CredentialsProvider from 'next-auth/providers/credentials';
import { endSessions } from './account-service';
import { secureCookies } from '@/lib/session-cookie';
import { authSecret } from './auth-secret';
import { signInWithPassword } from './password-sign-in';
import { clientAddress } from './client-address';

// next-auth 4 takes its origin from NEXTAUTH_URL, or from the Host header when this is set:
// the app then works on whatever host and port it is served from without configuration.
process.env.AUTH_TRUST_HOST ??= 'true';

export const SIGN_IN_PATH = '/sign-in';

export const authOptions: NextAuthOptions = {
  // A getter: read per request, so `next build` needs no secret and production without one fails loudly.
  get secret() {
    return authSecret();
  },
  session: { strategy: 'jwt', maxAge: 30 * 24 * 60 * 60 },
  // Secure cookies whenever the public origin is https, also when a TLS proxy talks http to the app.
  get useSecureCookies() {
    return secureCookies();
  },
  pages: { signIn: SIGN_IN_PATH, error: SIGN_IN_PATH },
  providers: [
    CredentialsProvider({
      name: 'E-mail and password',
      credentials: {
        email: { label: 'E-mail', type: 'email' },
        password: { label: 'Password', type: 'password' },
      },
      authorize: (credentials, req) => signInWithPassword(credentials, clientAddress(req.headers ?? {})),
    }),
  ],
  callbacks: {
    jwt({ token, user }) {
      if (user) {
        token.sub = user.id;
        token.sv = user.sessionVersion ?? 0;
      }
      return token;
    },
    session({ session, token }) {
      session.user = { id: token.sub ?? '', email: token.email ?? '', name: token.name ?? '', sessionVersion: token.sv ?? 0 };
      return session;
    },
  },
  events: {
    // Signing out raises the session version, so the cookie stops working even if it was saved.
    async signOut({ token }) {
      const userId = Number(token?.sub);
      if (Number.isInteger(userId) && userId > 0) await endSessions(userId, Number(token.sv ?? 0));
    },
  },
  logger: {
    // next-auth's own messages never carry the submitted password; keep them terse.
    error: (code) => console.error(`[auth] ${code}`),
    warn: () => undefined,
    debug: () => undefined,
  },
};
