import 'server-only';

/**
 * The origin that e-mailed links point at. APP_URL (or NEXTAUTH_URL) when set; outside
 * production the request's own origin. Production must set it, or a forged Host header
 * could make the app mail a reset link to somebody else's site.
 */
export function appOrigin(request: Request): string {
  const configured = process.env.APP_URL || process.env.NEXTAUTH_URL;
  if (configured) return new URL(configured).origin;
  if (process.env.NODE_ENV === 'production') {
    throw new Error('APP_URL is not set: production needs it for the links in e-mails (https://rimscale.example)');
  }
  return new URL(request.url).origin;
}
