/**
 * The pages' Content-Security-Policy (W3C CSP Level 3). Scripts run only with the per-request
 * nonce, which Next puts on its own inline scripts when it finds the policy on the request;
 * 'strict-dynamic' lets those load the app's chunks. Styles allow inline attributes (React's
 * style props and next/font's rules) but nothing from elsewhere. 'unsafe-eval' only in
 * development, where React's debugging needs it. No framing anywhere.
 */
export function contentSecurityPolicy(nonce: string, development: boolean): string {
  return [
    "default-src 'self'",
    `script-src 'self' 'nonce-${nonce}' 'strict-dynamic'${development ? " 'unsafe-eval'" : ''}`,
    "style-src 'self' 'unsafe-inline'",
    "img-src 'self' data: blob:",
    "font-src 'self' data:",
    "connect-src 'self'",
    "object-src 'none'",
    "base-uri 'self'",
    "form-action 'self'",
    "frame-ancestors 'none'",
  ].join('; ');
}

/** Headers every response carries (next.config.mjs sets them; the proxy adds the CSP to pages). */
export const SECURITY_HEADERS: ReadonlyArray<{ key: string; value: string }> = [
  { key: 'X-Frame-Options', value: 'DENY' },
  { key: 'Referrer-Policy', value: 'strict-origin-when-cross-origin' },
  { key: 'X-Content-Type-Options', value: 'nosniff' },
];
