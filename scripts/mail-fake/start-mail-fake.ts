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

const MAX_MESSAGE_BYTES = 1024 * 1024;

/**
 * A local SMTP server that accepts every message (no TLS, no auth: loopback only), keeps
 * it in memory and in `dataFile` (JSON), and answers over HTTP:
 *   GET /messages        → StoredMessage[] newest last (?to=address filters by recipient)
 *   DELETE /messages     → forgets everything
 *   GET /health          → { ok: true, count }
 */
export async function startMailFake(options: MailFakeOptions = {}): Promise<MailFake> {
  const host = options.host ?? '127.0.0.1';
  const messages: StoredMessage[] = loadStored(options.dataFile);
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
        const parsed = parseMessage(Buffer.concat(chunks).toString('utf8'));
        messages.push({
          ...parsed,
          id: (messages.at(-1)?.id ?? 0) + 1,
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
    return JSON.parse(fs.readFileSync(dataFile, 'utf8')) as StoredMessage[];
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
