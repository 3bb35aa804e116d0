/** A session cookie for the load benchmark, through the app's own sign-in (next-auth credentials). */

function cookiesOf(response: Response): string[] {
  return response.headers.getSetCookie().map((c) => c.split(';')[0]!);
}

export async function signIn(baseUrl: string, email: string, password: string): Promise<string> {
  const csrf = await fetch(new URL('/api/auth/csrf', baseUrl));
  const { csrfToken } = (await csrf.json()) as { csrfToken: string };
  const jar = cookiesOf(csrf);
  const response = await fetch(new URL('/api/auth/callback/credentials', baseUrl), {
    method: 'POST',
    redirect: 'manual',
    headers: { 'content-type': 'application/x-www-form-urlencoded', cookie: jar.join('; ') },
    body: new URLSearchParams({ csrfToken, email, password, json: 'true' }),
  });
  const session = cookiesOf(response).find((c) => c.includes('session-token='));
  if (!session) throw new Error(`sign-in as ${email} gave no session cookie (status ${response.status})`);
  return [...jar, session].join('; ');
}
