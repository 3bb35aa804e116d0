/**
 * Ends this browser's session the way next-auth's own client does (its CSRF token, then a form POST to its sign-out
 * endpoint) without shipping next-auth's client library to every page for one button.
 */
export async function signOutTo(callbackUrl: string): Promise<void> {
  const { csrfToken } = (await (await fetch('/api/auth/csrf')).json()) as { csrfToken: string };
  await fetch('/api/auth/signout', {
    method: 'POST',
    headers: { 'Content-Type': 'application/x-www-form-urlencoded' },
    body: new URLSearchParams({ csrfToken, callbackUrl, json: 'true' }),
  });
  window.location.href = callbackUrl;
}
