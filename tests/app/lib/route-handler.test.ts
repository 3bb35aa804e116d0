import { describe, expect, it, vi } from 'vitest';
import { AccessError } from '@/app/lib/authz';
import { guarded, SERVER_ERROR_MESSAGE } from '@/app/lib/route-handler';

describe('guarded', () => {
  it('passes the body’s own response through', async () => {
    const response = await guarded(async () => Response.json({ ok: true }, { status: 201 }));
    expect(response.status).toBe(201);
    expect(await response.json()).toEqual({ ok: true });
  });

  it('answers an AccessError with its status in the API error shape', async () => {
    const response = await guarded(async () => {
      throw new AccessError(403, 'This needs the owner role');
    });
    expect(response.status).toBe(403);
    expect(await response.json()).toEqual({ error: 'This needs the owner role', issues: [] });
  });

  it('answers anything else as a 500 without internals, and logs the error on the server', async () => {
    const log = vi.spyOn(console, 'error').mockImplementation(() => {});
    const failure = new Error('internal detail /work/secret/path.ts:12');
    const response = await guarded(async () => {
      throw failure;
    });
    expect(response.status).toBe(500);
    expect(response.headers.get('content-type')).toMatch(/application\/json/);
    const text = await response.text();
    expect(JSON.parse(text)).toEqual({ error: SERVER_ERROR_MESSAGE, issues: [] });
    expect(text).not.toMatch(/secret|\.ts:|at /);
    expect(log).toHaveBeenCalledWith(failure);
    log.mockRestore();
  });
});

describe('guarded for a state-changing request', () => {
  const ok = async (request: Request) => Response.json({ text: await request.text() });
  const post = (headers: Record<string, string>, body?: string) => new Request('http://app.test/api/x', { method: 'POST', headers, body });

  it('lets the app’s own origin, APP_URL’s origin and clients without browser headers through', async () => {
    expect((await guarded(post({ origin: 'http://app.test', 'content-type': 'application/json' }, '{}'), {}, ok)).status).toBe(200);
    expect((await guarded(post({ 'content-type': 'application/json' }, '{}'), {}, ok)).status).toBe(200);
    process.env.APP_URL = 'https://rimscale.example';
    try {
      expect((await guarded(post({ origin: 'https://rimscale.example', 'content-type': 'application/json' }, '{}'), {}, ok)).status).toBe(200);
    } finally {
      delete process.env.APP_URL;
    }
  });

  it('refuses Origin "null" (sandboxed frames, file: pages) and cross-site Fetch Metadata', async () => {
    expect((await guarded(post({ origin: 'null', 'content-type': 'application/json' }, '{}'), {}, ok)).status).toBe(403);
    expect((await guarded(post({ 'sec-fetch-site': 'cross-site', 'content-type': 'application/json' }, '{}'), {}, ok)).status).toBe(403);
  });

  it('takes an empty body without a type, but not a typeless body', async () => {
    expect((await guarded(post({}), {}, ok)).status).toBe(200);
    const typeless = new Request('http://app.test/api/x', { method: 'POST', headers: { 'content-length': '2' }, body: new Uint8Array([123, 125]) });
    expect((await guarded(typeless, {}, ok)).status).toBe(415);
  });

  it('hands a body framed by a Content-Length within the limit to the handler whole', async () => {
    const body = JSON.stringify({ note: 'x'.repeat(1000) });
    const response = await guarded(post({ 'content-type': 'application/json', 'content-length': String(body.length) }, body), { maxBytes: 2000 }, ok);
    expect(response.status).toBe(200);
    expect(await response.json()).toEqual({ text: body });
  });

  it('still counts a body that also names a Transfer-Encoding (RFC 9112 §6.3: the length is not the framing then)', async () => {
    const body = 'x'.repeat(3000);
    const headers = { 'content-type': 'application/json', 'content-length': '10', 'transfer-encoding': 'chunked' };
    expect((await guarded(post(headers, body), { maxBytes: 2000 }, ok)).status).toBe(413);
  });

  it('answers 413 for a declared length over the limit without calling the handler', async () => {
    let called = false;
    const response = await guarded(post({ 'content-type': 'application/json', 'content-length': String(65 * 1024) }), {}, async () => {
      called = true;
      return new Response(null);
    });
    expect(response.status).toBe(413);
    expect(called).toBe(false);
  });
});

describe('guarded’s own-origin check behind a bound address', () => {
  it('takes the Host the browser addressed as the app’s origin', async () => {
    // Next may put the bound name (0.0.0.0) in request.url; the browser's Origin then matches only its Host.
    const request = new Request('http://0.0.0.0:3000/api/x', {
      method: 'POST',
      headers: { host: '192.0.2.2:3000', origin: 'http://192.0.2.2:3000', 'content-type': 'application/json' },
      body: '{}',
    });
    expect((await guarded(request, {}, async () => new Response(null, { status: 204 }))).status).toBe(204);
  });
});
