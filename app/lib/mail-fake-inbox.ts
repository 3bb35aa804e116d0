import 'server-only';

export type InboxMessage = { id: number; to: string; subject: string; text: string; links: string[]; receivedAt: string };

/**
 * The development inbox exists only while the app runs beside the local SMTP fake:
 * MAIL_FAKE_URL must be set and point at this machine (127.0.0.1 / localhost / ::1).
 * A production configuration sets SMTP_URL and no MAIL_FAKE_URL, so the page is a 404 there.
 */
export function mailFakeUrl(): URL | null {
  const raw = process.env.MAIL_FAKE_URL;
  if (!raw) return null;
  try {
    const url = new URL(raw);
    return ['127.0.0.1', 'localhost', '[::1]'].includes(url.hostname) ? url : null;
  } catch {
    return null;
  }
}

export async function fakeInbox(base: URL): Promise<InboxMessage[]> {
  const res = await fetch(new URL('/messages', base), { cache: 'no-store' });
  if (!res.ok) throw new Error(`The mail fake answered HTTP ${res.status}`);
  const list = (await res.json()) as InboxMessage[];
  return list.slice().reverse();
}
