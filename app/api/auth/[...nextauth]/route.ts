import NextAuth from 'next-auth';
import { NextRequest } from 'next/server';
import { authOptions } from '@/app/lib/auth-options';
import { RATE_LIMITED_CODE } from '@/app/lib/password-sign-in';
import { guarded } from '@/app/lib/route-handler';

const handler = NextAuth(authOptions);

type Context = { params: Promise<{ nextauth: string[] }> };

/**
 * next-auth's own endpoints. Its POSTs (sign-in, sign-out) take form bodies and carry its
 * CSRF token; the route wrapper adds the origin check and the body limit every other
 * state-changing route has. A refusal by the rate limiter, which next-auth answers with 401
 * like any refused sign-in, becomes 429 here so clients and tests see the real reason.
 */
async function POST(incoming: Request, context: Context): Promise<Response> {
  return guarded(incoming, { accepts: ['form', 'json'] }, async (request) => {
    const response: Response = await handler(new NextRequest(request), context);
    if (response.status !== 401) return response;
    const text = await response.clone().text();
    if (!text.includes(`error=${RATE_LIMITED_CODE}`)) return response;
    return new Response(text, { status: 429, headers: response.headers });
  });
}

export { handler as GET, POST };
