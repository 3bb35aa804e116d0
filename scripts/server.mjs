/**
 * The production server: `npm start` (after `npm run build`). Serves the built app like
 * `next start`, and runs every request inside the socket-peer store that
 * app/lib/client-address.ts reads, so rate limits count the real TCP peer, never a header.
 *   HOST  address to listen on (default 127.0.0.1: this machine only; set 0.0.0.0 or an
 *         interface address on purpose to serve the network)
 *   PORT  port (default 3000)
 */
import { AsyncLocalStorage } from 'node:async_hooks';
import http from 'node:http';
import next from 'next';

const STORE_KEY = Symbol.for('rimscale.socket-peer');
globalThis[STORE_KEY] ??= new AsyncLocalStorage();
const peers = globalThis[STORE_KEY];

const hostname = process.env.HOST || '127.0.0.1';
const port = Number(process.env.PORT || 3000);

const app = next({ dev: false, hostname, port, dir: process.cwd() });
await app.prepare();
const handle = app.getRequestHandler();

const server = http.createServer((req, res) => {
  peers.run({ address: req.socket.remoteAddress ?? '' }, () => {
    handle(req, res).catch((err) => {
      console.error(err);
      if (!res.headersSent) res.writeHead(500).end();
    });
  });
});
server.listen(port, hostname, () => console.log(`Rimscale on http://${hostname.includes(':') ? `[${hostname}]` : hostname}:${port}`));

const stop = () => server.close(() => process.exit(0));
process.on('SIGINT', stop);
process.on('SIGTERM', stop);
