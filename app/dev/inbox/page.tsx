import type { Metadata } from 'next';
import { notFound } from 'next/navigation';
import { fakeInbox, inboxForThisRequest } from '@/app/lib/mail-fake-inbox';

export const metadata: Metadata = { title: 'Development inbox', robots: { index: false } };
export const dynamic = 'force-dynamic';

/** Mail caught by the local SMTP fake (scripts/mail-fake.ts): only with the fake in use, only to this machine. */
export default async function DevInboxPage() {
  const base = inboxForThisRequest();
  if (!base) notFound();
  let messages: Awaited<ReturnType<typeof fakeInbox>> = [];
  let problem: string | undefined;
  try {
    messages = await fakeInbox(base);
  } catch (err) {
    problem = `The mail fake at ${base.origin} did not answer (${err instanceof Error ? err.message : String(err)}). Start it with npx tsx scripts/mail-fake.ts.`;
  }
  return (
    <section className="space-y-4">
      <h1 className="text-2xl font-bold">Development inbox</h1>
      <p className="text-sm text-steel-600 dark:text-steel-300">
        Every e-mail the app sent to the local SMTP fake, newest first. Nothing here leaves this machine.
      </p>
      {problem ? <p role="alert" className="text-sm text-red-700">{problem}</p> : null}
      {messages.length === 0 && !problem ? <p className="text-sm text-steel-500">No messages yet.</p> : null}
      <ol className="space-y-4">
        {messages.map((m) => (
          <li key={m.id} className="rounded-md border border-steel-200 p-3 dark:border-steel-700">
            <p className="text-sm font-semibold">{m.subject}</p>
            <p className="text-xs text-steel-500">
              to {m.to} · {m.receivedAt}
            </p>
            <pre className="mt-2 whitespace-pre-wrap text-sm">{m.text}</pre>
            {m.links.map((link) => (
              <a key={link} href={link} className="block break-all text-sm text-gauge-700 underline dark:text-gauge-300">
                {link}
              </a>
            ))}
          </li>
        ))}
      </ol>
    </section>
  );
}
