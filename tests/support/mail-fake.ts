import { startMailFake, type MailFake, type StoredMessage } from '@/scripts/mail-fake/start-mail-fake';

/**
 * Starts the project's SMTP fake on free ports and points the app's mailer at it
 * (SMTP_URL), so tests send real SMTP and read what arrived over the fake's HTTP API.
 */
export async function useMailFake(): Promise<MailFake & { inbox: (to?: string) => Promise<StoredMessage[]> }> {
  const fake = await startMailFake();
  process.env.SMTP_URL = `smtp://127.0.0.1:${fake.smtpPort}`;
  return {
    ...fake,
    inbox: async (to) => {
      const query = to ? `?to=${encodeURIComponent(to)}` : '';
      const res = await fetch(`http://127.0.0.1:${fake.httpPort}/messages${query}`);
      return (await res.json()) as StoredMessage[];
    },
    stop: async () => {
      delete process.env.SMTP_URL;
      await fake.stop();
    },
  };
}
