import 'server-only';
import { jsonError } from './api';

/**
 * The origins the app's own pages are served from: the one the browser addressed (its Host
 * header, which a page of another origin cannot set; Next's request.url may carry the
 * server's bound name instead) and APP_URL's when set (behind a TLS proxy).
 */
function ownOrigins(request: Request): Set<string> {
  const url = new URL(request.url);
  const origins = new Set([url.origin]);
  const host = request.headers.get('host');
  if (host) origins.add(`${url.protocol}//${host}`);
  const configured = process.env.APP_URL || process.env.NEXTAUTH_URL;
  if (configured) origins.add(new URL(configured).origin);
  return origins;
}

/**
 * 403 for a state-changing request a browser sent from another origin: its Origin header is
 * not the app's own, or, without Origin, Fetch Metadata says cross-site or same-site (another
 * origin of the same site, such as another port on the same host). SameSite=Lax cookies
 * do not stop the second kind. Requests without either header (curl, scripts) carry no
 * browser's cookies unasked and pass.
 */
export function crossOriginRefusal(request: Request): Response | null {
  const origin = request.headers.get('origin');
  const site = request.headers.get('sec-fetch-site');
  const foreign = origin !== null ? !ownOrigins(request).has(origin) : site === 'cross-site' || site === 'same-site';
  if (!foreign) return null;
  return jsonError(403, 'This request came from a page of another site or origin and was refused', [
    { path: '(origin)', message: `Origin ${origin ?? '(not sent)'} is not this application's origin` },
  ]);
}
