/**
 * The local SMTP fake for development, the demo and the browser tests:
 *   npx tsx scripts/mail-fake.ts
 * MAIL_FAKE_SMTP_PORT (default 2525), MAIL_FAKE_HTTP_PORT (default 2580) and
 * MAIL_FAKE_DATA_FILE (default data/mail-fake/messages.json) choose where it listens and
 * stores. Point the app at it with SMTP_URL=smtp://127.0.0.1:<smtp port> and
 * MAIL_FAKE_URL=http://127.0.0.1:<http port> (which also turns on /dev/inbox).
 */
import path from 'node:path';
import { startMailFake } from './mail-fake/start-mail-fake';

void startMailFake({
  smtpPort: Number(process.env.MAIL_FAKE_SMTP_PORT ?? 2525),
  httpPort: Number(process.env.MAIL_FAKE_HTTP_PORT ?? 2580),
  dataFile: process.env.MAIL_FAKE_DATA_FILE ?? path.join(process.cwd(), 'data', 'mail-fake', 'messages.json'),
}).then((fake) => {
  console.log(`mail fake: SMTP on 127.0.0.1:${fake.smtpPort}, messages at http://127.0.0.1:${fake.httpPort}/messages`);
  const stop = () => void fake.stop().then(() => process.exit(0));
  process.on('SIGINT', stop);
  process.on('SIGTERM', stop);
});
