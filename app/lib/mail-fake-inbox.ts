import 'server-only';
import { isLoopback, socketPeerAddress } from './client-address';
import { smtpUrl } from './mailer';

export type InboxMessage = { id: number; to: string; subject: string; text: string; links: string[]; receivedAt: string };

/**
 * The development inbox exists only while the app runs beside the local SMTP fake:
 * MAIL_FAKE_URL must be set and point at this machine (127.0.0.1 / localhost / ::1).
 * A production configuration sets SMTP_URL and no MAIL_FAKE_URL, so the page is a 404 there.
 */
const LOOPBACK_HOSTS = ['127.0.0.1', 'localhost', '[::1]'];

function loopbackUrl(raw: string | undefined): URL | null {
  if (!raw) return null;
  try {
    const url = new URL(raw);
    return LOOPBACK_HOSTS.includes(url.hostname) ? url : null;
  } catch {
    return null;
  }
}

export function mailFakeUrl(): URL | null {
  return loopbackUrl(process.env.MAIL_FAKE_URL);
}

/**
 * The inbox for this request, or null (the page answers 404). It holds password-reset links,
 * so it opens only while the fake is really in use (MAIL_FAKE_URL and the SMTP server both on
 * this machine) and only to a client on this machine: the socket peer is a loopback address.
 * Under `next dev` (bound to 127.0.0.1 by `npm run dev`) the peer is not known and is allowed.
 */
export function inboxForThisRequest(): URL | null {
  const base = mailFakeUrl();
  if (!base || !loopbackUrl(smtpUrl())) return null;
  const peer = socketPeerAddress();
  const allowed = peer === null ? process.env.NODE_ENV === 'development' : isLoopback(peer);
  return allowed ? base : null;
}

export async function fakeInbox(base: URL): Promise<InboxMessage[]> {
  const res = await fetch(new URL('/messages', base), { cache: 'no-store' });
  if (!res.ok) throw new Error(`The mail fake answered HTTP ${res.status}`);
  const list = (await res.json()) as InboxMessage[];
  return list.slice().reverse();
}
