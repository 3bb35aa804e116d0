/**
 * What the sign-in page says for each next-auth error code. One sentence for every
 * refused password, so nobody can learn whether an address has an account.
 */
export const SIGN_IN_REFUSED = 'That e-mail and password do not match. Check both, or reset the password.';
export const SIGN_IN_RATE_LIMITED =
  'Too many sign-in attempts for this account or from this network. Wait 15 minutes and try again, or reset the password.';

export function signInErrorMessage(code: string | null | undefined): string | undefined {
  if (!code) return undefined;
  if (code === 'RateLimited') return SIGN_IN_RATE_LIMITED;
  if (code === 'SessionRequired') return 'Sign in to see that page.';
  return SIGN_IN_REFUSED;
}
