import { afterEach, describe, expect, it, vi } from 'vitest';
import { clientAddress, runWithSocketPeer } from '@/app/lib/client-address';

afterEach(() => {
  vi.unstubAllEnvs();
});

// Addresses from the documentation ranges of RFC 5737.
const forged = { 'x-forwarded-for': '203.0.113.99' };

describe('clientAddress', () => {
  it('is the socket peer, whatever X-Forwarded-For says, when no proxy is trusted', () => {
    expect(runWithSocketPeer('198.51.100.1', () => clientAddress(forged))).toBe('198.51.100.1');
    expect(runWithSocketPeer('::ffff:198.51.100.1', () => clientAddress(new Headers(forged)))).toBe('198.51.100.1');
  });

  it('reads X-Forwarded-For from the right, TRUSTED_PROXY_HOPS entries in', () => {
    // Client 192.0.2.5 → proxy A (appends 192.0.2.5) → proxy B (appends A's address 10.0.0.2) → app; the client forged the first entry.
    const headers = { 'x-forwarded-for': '203.0.113.99, 192.0.2.5, 10.0.0.2' };
    vi.stubEnv('TRUSTED_PROXY_HOPS', '2');
    expect(runWithSocketPeer('10.0.0.3', () => clientAddress(headers))).toBe('192.0.2.5');
    vi.stubEnv('TRUSTED_PROXY_HOPS', '1');
    expect(runWithSocketPeer('10.0.0.3', () => clientAddress(headers))).toBe('10.0.0.2');
    // Reached directly, without the header: the socket peer.
    expect(runWithSocketPeer('192.0.2.8', () => clientAddress({}))).toBe('192.0.2.8');
  });

  it('refuses a TRUSTED_PROXY_HOPS that is not a whole number', () => {
    vi.stubEnv('TRUSTED_PROXY_HOPS', 'yes');
    expect(() => runWithSocketPeer('192.0.2.8', () => clientAddress({}))).toThrow(/whole number/);
  });

  it('puts every client of a server with no known peer under one key (limits still apply)', () => {
    expect(clientAddress(forged)).toBe(clientAddress({ 'x-forwarded-for': '203.0.113.100' }));
  });
});
