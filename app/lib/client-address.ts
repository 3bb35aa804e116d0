import 'server-only';
import { AsyncLocalStorage } from 'node:async_hooks';
import { isIP } from 'node:net';

type SocketPeer = { address: string };

/**
 * The TCP peer of the request being handled. Next's route handlers do not expose the socket,
 * so scripts/server.mjs (the production server) runs each request inside this store with
 * `req.socket.remoteAddress`; nothing a client sends can set it. Shared through a global
 * symbol because the server script and the app bundle are separate module graphs.
 */
const STORE_KEY = Symbol.for('rimscale.socket-peer');
const globalStore = globalThis as unknown as Record<symbol, AsyncLocalStorage<SocketPeer> | undefined>;

function peerStore(): AsyncLocalStorage<SocketPeer> {
  globalStore[STORE_KEY] ??= new AsyncLocalStorage<SocketPeer>();
  return globalStore[STORE_KEY];
}

/** Runs `body` as if its request came from `address` (tests; the server script does the same). */
export function runWithSocketPeer<T>(address: string, body: () => T): T {
  return peerStore().run({ address }, body);
}

/** The socket peer's address, IPv4-mapped IPv6 (::ffff:1.2.3.4) written as IPv4; null when unknown. */
export function socketPeerAddress(): string | null {
  const address = peerStore().getStore()?.address;
  if (!address) return null;
  return address.startsWith('::ffff:') && isIP(address.slice(7)) === 4 ? address.slice(7) : address;
}

export function isLoopback(address: string | null): boolean {
  return address !== null && (address === '::1' || /^127\.\d+\.\d+\.\d+$/.test(address));
}

/** TRUSTED_PROXY_HOPS: how many reverse proxies of the operator's stand in front of the app (default 0). */
export function trustedProxyHops(): number {
  const raw = process.env.TRUSTED_PROXY_HOPS?.trim();
  if (!raw) return 0;
  if (!/^\d{1,2}$/.test(raw)) throw new Error(`TRUSTED_PROXY_HOPS must be a whole number of proxies (0–99); got "${raw}"`);
  return Number(raw);
}

let warnedUnknown = false;

/**
 * The client address the per-address limits count: the socket peer; with TRUSTED_PROXY_HOPS = n,
 * the X-Forwarded-For entry n places from the right (each trusted proxy appends the address it
 * saw, so entries left of that were written by the client and may be forged). A chain shorter
 * than n gives its leftmost entry. Without a known peer (the app not started by
 * scripts/server.mjs) every client shares one key, which fails safe: limits still bite.
 */
export function clientAddress(headers: Headers | Record<string, string | string[] | undefined> = {}): string {
  const peer = socketPeerAddress();
  const hops = trustedProxyHops();
  if (hops > 0) {
    const header = headers instanceof Headers ? headers.get('x-forwarded-for') : [headers['x-forwarded-for']].flat().join(',');
    const chain = (header ?? '').split(',').map((entry) => entry.trim()).filter((entry) => entry !== '');
    if (chain.length > 0) return chain[Math.max(0, chain.length - hops)]!;
  }
  if (peer) return peer;
  if (!warnedUnknown && process.env.NODE_ENV === 'production') {
    warnedUnknown = true;
    console.warn('[client-address] the socket address is unknown: start the app with `npm start` (scripts/server.mjs), not `next start`');
  }
  return 'unknown-peer';
}
