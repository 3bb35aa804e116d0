import fs from 'node:fs';
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import path from 'node:path';
import { SMTPServer } from 'smtp-server';
import { parseMessage, type ParsedMessage } from './parse-message';

export type StoredMessage = ParsedMessage & { id: number; receivedAt: string; envelopeTo: string[] };

export type MailFake = {
  smtpPort: number;
  httpPort: number;
  messages: () => StoredMessage[];
  stop: () => Promise<void>;
};

export type MailFakeOptions = { smtpPort?: number; httpPort?: number; dataFile?: string; host?: string };

const MAX_MESSAGE_BYTES = 4 * 1024 * 1024;

/**
 * A local SMTP server that accepts every message (no TLS, no auth: loopback only), keeps
 * it in memory and in `dataFile` (JSON), and answers over HTTP:
 *   GET /messages        → StoredMessage[] newest last (?to=address filters by recipient), each with
 *                          attachments: [{ filename, contentType, size }]
 *   GET /messages/:id/attachments/:n → the n-th attachment's bytes (from 0), with its content type
 *   DELETE /messages     → forgets everything
 *   GET /health          → { ok: true, count }
 */
export async function startMailFake(options: MailFakeOptions = {}): Promise<MailFake> {
  const host = options.host ?? '127.0.0.1';
  const messages: StoredMessage[] = loadStored(options.dataFile);
  // Attachment bytes stay in memory only: the JSON list and file carry their names, types and sizes.
  const contents = new Map<number, Buffer[]>();
  const save = () => {
    if (options.dataFile) fs.writeFileSync(options.dataFile, JSON.stringify(messages, null, 2));
  };

  const smtp = new SMTPServer({
    secure: false,
    authOptional: true,
    disabledCommands: ['AUTH', 'STARTTLS'],
    logger: false,
    size: MAX_MESSAGE_BYTES,
    onData(stream, session, callback) {
      const chunks: Buffer[] = [];
      stream.on('data', (chunk: Buffer) => chunks.push(chunk));
      stream.on('end', () => {
        const { attachmentContents, ...parsed } = parseMessage(Buffer.concat(chunks).toString('utf8'));
        const id = (messages.at(-1)?.id ?? 0) + 1;
        contents.set(id, attachmentContents);
        messages.push({
          ...parsed,
          id,
          receivedAt: new Date().toISOString(),
          envelopeTo: session.envelope.rcptTo.map((r) => r.address.toLowerCase()),
        });
        save();
        callback();
      });
    },
  });

  const web = http.createServer((req, res) => {
    const url = new URL(req.url ?? '/', `http://${host}`);
    const send = (status: number, body: unknown) => {
      res.writeHead(status, { 'content-type': 'application/json' });
      res.end(JSON.stringify(body));
    };
    // The caught mail holds password-reset links: only this machine may read it, whatever `host` it listens on.
    if (!isLoopbackPeer(req.socket.remoteAddress)) return send(403, { error: 'The mail fake answers this machine only' });
    if (url.pathname === '/health') return send(200, { ok: true, count: messages.length });
    const attachment = /^\/messages\/(\d+)\/attachments\/(\d+)$/.exec(url.pathname);
    if (attachment) {
      const id = Number(attachment[1]);
      const index = Number(attachment[2]);
      const bytes = contents.get(id)?.[index];
      const meta = messages.find((m) => m.id === id)?.attachments[index];
      if (!bytes || !meta) return send(404, { error: 'No such attachment' });
      res.writeHead(200, { 'content-type': meta.contentType, 'content-length': bytes.length });
      return res.end(bytes);
    }
    if (url.pathname !== '/messages') return send(404, { error: 'Try GET /messages' });
    if (req.method === 'DELETE') {
      messages.length = 0;
      save();
      return send(200, { ok: true });
    }
    const to = url.searchParams.get('to')?.toLowerCase();
    return send(200, to ? messages.filter((m) => m.envelopeTo.includes(to)) : messages);
  });

  const smtpPort = await listen((port, done) => smtp.listen(port, host, done), smtp, options.smtpPort ?? 0);
  const httpPort = await listen((port, done) => web.listen(port, host, done), web, options.httpPort ?? 0);
  return {
    smtpPort,
    httpPort,
    messages: () => [...messages],
    stop: () =>
      new Promise<void>((resolve) => {
        web.close(() => smtp.close(() => resolve()));
      }),
  };
}

/** 127.0.0.0/8 and ::1 (RFC 1122 §3.2.1.3, RFC 4291 §2.5.3), also written IPv4-mapped. */
export function isLoopbackPeer(address: string | undefined): boolean {
  const bare = address?.startsWith('::ffff:') ? address.slice(7) : address;
  return bare === '::1' || /^127\.\d+\.\d+\.\d+$/.test(bare ?? '');
}

function loadStored(dataFile: string | undefined): StoredMessage[] {
  if (!dataFile) return [];
  fs.mkdirSync(path.dirname(dataFile), { recursive: true });
  try {
    const stored = JSON.parse(fs.readFileSync(dataFile, 'utf8')) as StoredMessage[];
    return stored.map((m) => ({ ...m, attachments: m.attachments ?? [] }));
  } catch {
    return [];
  }
}

type Listener = { server?: { address: () => AddressInfo | string | null }; address?: () => AddressInfo | string | null };

function listen(
  start: (port: number, done: () => void) => void,
  target: SMTPServer | http.Server,
  port: number,
): Promise<number> {
  return new Promise((resolve, reject) => {
    const emitter = target as unknown as NodeJS.EventEmitter;
    emitter.once('error', reject);
    start(port, () => {
      const holder = target as unknown as Listener;
      const address = (holder.server ?? holder).address?.();
      resolve(typeof address === 'object' && address ? address.port : port);
    });
  });
}
