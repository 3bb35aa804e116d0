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
import v8 from 'node:v8';
import next from 'next';

// V8 lets the heap grow to a multiple of what was live at the last full collection before it collects again,
// and under a few hundred requests a second it let this thread's heap reach ~250 MB with ~80 MB live (the
// server's peak resident memory near 850 MB). Growing by a quarter keeps each thread's heap near what it
// holds: the load bench measured the same throughput and a third of the peak. It is no ceiling: a large
// import still gets the memory it needs. The flag is read at each collection; worker threads share it.
//   RIMSCALE_HEAP_GROWTH_PERCENT  growth allowed between full collections (default 25; 0: V8's own choice)
// `npm start` also gives the process 8 MB semi-spaces (V8's default is 16; node's --max-semi-space-size can only be
// set at start, so it is in package.json): under the load bench the server's peak resident memory was 418–420 MB
// with them and 431–465 MB without, at the same throughput within the machine's run-to-run spread. Being a V8 flag,
// it holds for the PDF worker threads too, over the pool's own young-generation limit (app/lib/pdf-pool.ts).
const heapGrowthPercent = Number(process.env.RIMSCALE_HEAP_GROWTH_PERCENT ?? 25);
if (heapGrowthPercent > 0) v8.setFlagsFromString(`--heap-growing-percent=${Math.round(heapGrowthPercent)}`);

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
