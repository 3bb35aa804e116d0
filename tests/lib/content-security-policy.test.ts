import { describe, expect, it } from 'vitest';
import { contentSecurityPolicy, SECURITY_HEADERS } from '@/lib/content-security-policy';
import path from 'node:path';
import type { NextConfig } from 'next';

const directives = (policy: string) => new Map(policy.split('; ').map((d) => [d.split(' ')[0]!, d.split(' ').slice(1)]));

describe('contentSecurityPolicy', () => {
  it('lets scripts run by nonce only, never eval in production, and forbids framing (W3C CSP Level 3)', () => {
    const production = directives(contentSecurityPolicy('bm9uY2U=', false));
    expect(production.get('script-src')).toEqual(["'self'", "'nonce-bm9uY2U='", "'strict-dynamic'"]);
    expect(production.get('frame-ancestors')).toEqual(["'none'"]);
    expect(production.get('object-src')).toEqual(["'none'"]);
    expect([...production.values()].flat()).not.toContain("'unsafe-eval'");
    expect(directives(contentSecurityPolicy('x', true)).get('script-src')).toContain("'unsafe-eval'");
  });
});

describe('next.config.mjs headers', () => {
  it('sends the security headers on every path', async () => {
    const nextConfig = (await import(/* @vite-ignore */ path.join(process.cwd(), 'next.config.mjs'))).default as NextConfig;
    const rules = await nextConfig.headers!();
    const everywhere = rules.find((r) => r.source === '/:path*');
    expect(everywhere?.headers).toEqual(SECURITY_HEADERS);
  });
});
