/** A callbackUrl kept only if it is a path on this site (never `//host` or `https://…`). */
export function safeCallbackPath(value: string | null | undefined, fallback = '/account'): string {
  if (!value || !value.startsWith('/') || value.startsWith('//') || value.startsWith('/\\')) return fallback;
  return value;
}
