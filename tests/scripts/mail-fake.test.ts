import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import nodemailer from 'nodemailer';
import { afterEach, describe, expect, it } from 'vitest';
import { decodeQuotedPrintable } from '@/scripts/mail-fake/parse-message';
import { isLoopbackPeer, startMailFake, type MailFake } from '@/scripts/mail-fake/start-mail-fake';

const started: MailFake[] = [];
afterEach(async () => {
  await Promise.all(started.splice(0).map((f) => f.stop()));
});

async function fake(dataFile?: string) {
  const f = await startMailFake({ dataFile });
  started.push(f);
  return f;
}

// nodemailer is the independent writer here: it picks the encodings (RFC 2045 quoted-printable, RFC 2047 words).
async function send(f: MailFake, mail: { to: string; subject: string; text: string }) {
  await nodemailer.createTransport(`smtp://127.0.0.1:${f.smtpPort}`).sendMail({ from: 'app@rimscale.test', ...mail });
}

describe('the local SMTP fake', () => {
  it('decodes what nodemailer sends (non-ASCII subject, long quoted-printable text) and lists its links', async () => {
    const f = await fake();
    const text = `Grüße — open https://app.test/reset-password/confirm?token=Ab_12-cd now.\n${'ø'.repeat(120)}`;
    await send(f, { to: 'Åsa <asa@example.test>', subject: 'Nytt lösenord för Rimscale', text });
    const res = await fetch(`http://127.0.0.1:${f.httpPort}/messages`);
    const [message] = (await res.json()) as Record<string, unknown>[];
    expect(message).toMatchObject({
      subject: 'Nytt lösenord för Rimscale',
      to: 'Åsa <asa@example.test>',
      envelopeTo: ['asa@example.test'],
      links: ['https://app.test/reset-password/confirm?token=Ab_12-cd'],
    });
    expect(String(message!.text).trim()).toBe(text);
  });

  it('filters by recipient, forgets on DELETE and answers /health', async () => {
    const f = await fake();
    await send(f, { to: 'a@example.test', subject: 'one', text: 'x' });
    await send(f, { to: 'b@example.test', subject: 'two', text: 'y' });
    const base = `http://127.0.0.1:${f.httpPort}`;
    const forB = (await (await fetch(`${base}/messages?to=B@example.test`)).json()) as { subject: string }[];
    expect(forB.map((m) => m.subject)).toEqual(['two']);
    expect(await (await fetch(`${base}/health`)).json()).toEqual({ ok: true, count: 2 });
    await fetch(`${base}/messages`, { method: 'DELETE' });
    expect(await (await fetch(`${base}/messages`)).json()).toEqual([]);
  });

  it('keeps messages in its JSON file across a restart', async () => {
    const dataFile = path.join(fs.mkdtempSync(path.join(os.tmpdir(), 'rimscale-mail-')), 'messages.json');
    const first = await fake(dataFile);
    await send(first, { to: 'keep@example.test', subject: 'kept', text: 'z' });
    await first.stop();
    started.splice(started.indexOf(first), 1);
    const second = await fake(dataFile);
    expect(second.messages().map((m) => [m.id, m.subject])).toEqual([[1, 'kept']]);
    fs.rmSync(path.dirname(dataFile), { recursive: true, force: true });
  });
});

describe('decodeQuotedPrintable', () => {
  it('joins soft line breaks and decodes =XX octets as UTF-8 (RFC 2045 §6.7)', () => {
    expect(decodeQuotedPrintable('caf=C3=A9 is=\r\n one word=3D')).toBe('café is one word=');
  });
});

describe('the mail fake HTTP API', () => {
  it('answers loopback peers only, even when listening on every interface', async () => {
    const f = await startMailFake({ host: '0.0.0.0' });
    started.push(f);
    expect((await fetch(`http://127.0.0.1:${f.httpPort}/messages`)).status).toBe(200);
    // Reach it through this machine's own network address: the socket peer is then that address, not loopback.
    const external = Object.values(os.networkInterfaces()).flat().find((i) => i && !i.internal && i.family === 'IPv4');
    if (external) {
      const res = await fetch(`http://${external.address}:${f.httpPort}/messages`);
      expect(res.status).toBe(403);
    }
    expect(isLoopbackPeer('::ffff:127.0.0.1')).toBe(true);
    expect(isLoopbackPeer('127.8.9.10')).toBe(true);
    expect(isLoopbackPeer('::1')).toBe(true);
    expect(isLoopbackPeer('192.0.2.2')).toBe(false);
    expect(isLoopbackPeer('::ffff:10.0.0.1')).toBe(false);
    expect(isLoopbackPeer(undefined)).toBe(false);
  });
});

describe('the local SMTP fake with attachments', () => {
  it('lists each attachment as { filename, contentType, size } and serves its bytes', async () => {
    const f = await fake();
    // nodemailer writes the MIME multipart message (RFC 2046) with a base64 part; the fake reads it back.
    const bytes = Buffer.concat([Buffer.from('%PDF-1.3\n'), Buffer.alloc(5000, 0xa7)]);
    await nodemailer.createTransport(`smtp://127.0.0.1:${f.smtpPort}`).sendMail({
      from: 'app@rimscale.test',
      to: 'c@example.test',
      subject: 'With a file',
      text: 'See the attached record.',
      attachments: [{ filename: 'timing-record-7.pdf', content: bytes, contentType: 'application/pdf' }],
    });
    const base = `http://127.0.0.1:${f.httpPort}`;
    const [message] = (await (await fetch(`${base}/messages`)).json()) as Array<{ id: number; text: string; attachments: unknown[] }>;
    expect(message!.text.trim()).toBe('See the attached record.');
    expect(message!.attachments).toEqual([{ filename: 'timing-record-7.pdf', contentType: 'application/pdf', size: bytes.length }]);
    const served = await fetch(`${base}/messages/${message!.id}/attachments/0`);
    expect(served.headers.get('content-type')).toBe('application/pdf');
    expect(Buffer.from(await served.arrayBuffer()).equals(bytes)).toBe(true);
    expect((await fetch(`${base}/messages/${message!.id}/attachments/1`)).status).toBe(404);
  });

  it('lists no attachments for a plain text message', async () => {
    const f = await fake();
    await send(f, { to: 'd@example.test', subject: 'plain', text: 'just text' });
    const [message] = (await (await fetch(`http://127.0.0.1:${f.httpPort}/messages`)).json()) as Array<{ attachments: unknown[] }>;
    expect(message!.attachments).toEqual([]);
  });
});
