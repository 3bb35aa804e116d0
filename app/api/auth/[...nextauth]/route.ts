import NextAuth from 'next-auth';
import { authOptions } from '@/app/lib/auth-options';
import { RATE_LIMITED_CODE } from '@/app/lib/password-sign-in';

const handler = NextAuth(authOptions);

type Context = { params: Promise<{ nextauth: string[] }> };

/**
 * next-auth answers every refused credentials sign-in with 401; a refusal by the rate
 * limiter is turned into 429 here so clients and tests see the real reason.
 */
async function withRateLimitStatus(request: Request, context: Context): Promise<Response> {
  const response: Response = await handler(request, context);
  if (response.status !== 401) return response;
  const text = await response.clone().text();
  if (!text.includes(`error=${RATE_LIMITED_CODE}`)) return response;
  return new Response(text, { status: 429, headers: response.headers });
}

export { handler as GET, withRateLimitStatus as POST };
