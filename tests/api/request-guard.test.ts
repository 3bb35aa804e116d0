import fs from 'node:fs';
import path from 'node:path';
import { describe, expect, it, vi } from 'vitest';
import { POST as tdc } from '@/app/api/v1/calc/tdc/route';
import { POST as invite } from '@/app/api/v1/workspaces/[workspace]/invitations/route';
import { POST as importCsv } from '@/app/api/v1/workspaces/[workspace]/templates/import/route';
import { POST as uploadPhoto } from '@/app/api/v1/workspaces/[workspace]/templates/[id]/photos/route';
import { TABLES } from '@/db/tables';
import { useAccessWorldPerTest, useMailFakeForFile } from '@/tests/support/route-test-hooks';

vi.mock('@/app/lib/session', () => import('@/tests/support/session'));

const ROOT = process.cwd();
const WRITE_METHODS = ['POST', 'PUT', 'PATCH', 'DELETE'] as const;
const APP = 'http://rimscale.test';
/** Another origin of the same site: the app on one port, a hostile page on another (issue 11, hole 2). */
const OTHER_PORT = 'http://rimscale.test:8081';

type Handler = (request: Request, context: { params: Promise<Record<string, string | string[]>> }) => Promise<Response>;

function routeFiles(dir = path.join(ROOT, 'app')): string[] {
  return fs.readdirSync(dir, { withFileTypes: true }).flatMap((entry) => {
    const full = path.join(dir, entry.name);
    if (entry.isDirectory()) return routeFiles(full);
    return entry.name === 'route.ts' ? [full] : [];
  });
}

async function writeHandlers(): Promise<Array<[string, Handler]>> {
  const handlers: Array<[string, Handler]> = [];
  for (const file of routeFiles()) {
    const mod = (await import(/* @vite-ignore */ file)) as Record<string, unknown>;
    for (const method of WRITE_METHODS)
      if (typeof mod[method] === 'function') handlers.push([`${method} ${path.relative(ROOT, file)}`, mod[method] as Handler]);
  }
  return handlers;
}

const anyParams = { params: Promise.resolve({ workspace: 'world-shop', id: '1', photoId: '1', version: '1', userId: '1', invitationId: '1', profileId: '1', nextauth: ['signout'] }) };

function formPost(method: string, headers: Record<string, string>): Request {
  // What <form enctype="text/plain"> sends: a body that happens to parse as JSON.
  return new Request(`${APP}/api/any`, { method, headers: { 'content-type': 'text/plain', ...headers }, body: '{"email":"x@y.test","role":"owner","a":"=b"}' });
}

useMailFakeForFile();

describe('every state-changing route handler', () => {
  it('refuses a request from another origin with 403, before reading anything', async () => {
    const handlers = await writeHandlers();
    expect(handlers.length).toBeGreaterThan(20);
    for (const [name, handler] of handlers) {
      const byOrigin = await handler(formPost(name.split(' ')[0]!, { origin: OTHER_PORT }), anyParams);
      expect(byOrigin.status, `${name} with Origin ${OTHER_PORT}`).toBe(403);
      // Without Origin, Fetch Metadata (W3C Fetch Metadata Request Headers) still tells another origin of the same site.
      const bySite = await handler(formPost(name.split(' ')[0]!, { 'sec-fetch-site': 'same-site' }), anyParams);
      expect(bySite.status, `${name} with Sec-Fetch-Site: same-site`).toBe(403);
    }
  });

  it('refuses a text/plain body with 415, even from its own origin', async () => {
    for (const [name, handler] of await writeHandlers()) {
      const response = await handler(formPost(name.split(' ')[0]!, { origin: APP, 'sec-fetch-site': 'same-origin' }), anyParams);
      expect(response.status, name).toBe(415);
    }
  });
});

describe('the cross-origin text/plain invitation (issue 11, hole 2)', () => {
  const world = useAccessWorldPerTest({ actingAs: 'owner' });
  const url = () => `${APP}/api/v1/workspaces/${world.shop.slug}/invitations`;
  const params = () => ({ params: Promise.resolve({ workspace: world.shop.slug }) });
  const body = JSON.stringify({ email: 'attacker@elsewhere.test', role: 'owner' });

  it('is refused with 403 from another port and 415 as text/plain, and nothing is stored', async () => {
    const crossOrigin = await invite(new Request(url(), { method: 'POST', headers: { origin: OTHER_PORT, 'content-type': 'text/plain' }, body }), params());
    expect(crossOrigin.status).toBe(403);
    const plain = await invite(new Request(url(), { method: 'POST', headers: { 'content-type': 'text/plain' }, body }), params());
    expect(plain.status).toBe(415);
    const crossJson = await invite(new Request(url(), { method: 'POST', headers: { origin: OTHER_PORT, 'content-type': 'application/json' }, body }), params());
    expect(crossJson.status).toBe(403);
    expect(await world.knex(TABLES.invitations).count({ n: '*' })).toEqual([{ n: 0 }]);
  });

  it('still works from the app itself', async () => {
    const own = await invite(new Request(url(), { method: 'POST', headers: { origin: APP, 'content-type': 'application/json' }, body }), params());
    expect(own.status).toBe(201);
  });
});

/** A body of `totalBytes` made lazily in 64 KiB chunks, with no Content-Length (sent chunked). */
function lazyBody(totalBytes: number): { body: ReadableStream<Uint8Array>; pulledBytes: () => number } {
  let pulled = 0;
  const body = new ReadableStream<Uint8Array>({
    pull(controller) {
      if (pulled >= totalBytes) return controller.close();
      const chunk = new Uint8Array(64 * 1024).fill(0x20);
      pulled += chunk.byteLength;
      controller.enqueue(chunk);
    },
  });
  return { body, pulledBytes: () => pulled };
}

function streamed(url: string, type: string, body: ReadableStream<Uint8Array>): Request {
  const init: RequestInit & { duplex: 'half' } = { method: 'POST', headers: { 'content-type': type }, body, duplex: 'half' };
  return new Request(url, init);
}

describe('bodies are cut off while they stream in (issue 11, hole 3)', () => {
  it('answers a chunked 200 MB JSON body with 413, growing the process by less than 20 MB', async () => {
    const { body, pulledBytes } = lazyBody(200 * 1024 * 1024);
    const before = process.memoryUsage();
    const response = await tdc(streamed(`${APP}/api/v1/calc/tdc`, 'application/json', body));
    const after = process.memoryUsage();
    expect(response.status).toBe(413);
    expect((await response.json()).error).toMatch(/larger than 64 KiB/);
    const growthMb = (after.rss - before.rss) / (1024 * 1024);
    console.info(`200 MB chunked body: ${(pulledBytes() / 1024).toFixed(0)} KiB read, RSS growth ${growthMb.toFixed(1)} MB`);
    expect(growthMb).toBeLessThan(20);
    // Only the limit and the few chunks the streams queue ahead were ever pulled from the client.
    expect(pulledBytes()).toBeLessThanOrEqual(64 * 1024 + 4 * 64 * 1024);
  });

  describe('in uploads', () => {
    const world = useAccessWorldPerTest({ actingAs: 'technician' });

    it('cuts a chunked CSV import and a chunked photo upload at their limits', async () => {
      const csv = lazyBody(200 * 1024 * 1024);
      const imported = await importCsv(streamed(`${APP}/api/v1/workspaces/${world.shop.slug}/templates/import`, 'text/csv', csv.body), {
        params: Promise.resolve({ workspace: world.shop.slug }),
      });
      expect(imported.status).toBe(413);
      expect(csv.pulledBytes()).toBeLessThan(17 * 1024 * 1024);

      const [template] = await world.knex(TABLES.templates).insert({ workspace_id: world.shop.id, name: 'Photo target', version: 1, created_at: '2026-01-01', updated_at: '2026-01-01' }).returning('id');
      const photo = lazyBody(200 * 1024 * 1024);
      const uploaded = await uploadPhoto(
        streamed(`${APP}/api/v1/workspaces/${world.shop.slug}/templates/${template.id}/photos`, 'multipart/form-data; boundary=x', photo.body),
        { params: Promise.resolve({ workspace: world.shop.slug, id: String(template.id) }) },
      );
      expect(uploaded.status).toBe(413);
      expect(photo.pulledBytes()).toBeLessThan(11 * 1024 * 1024);
    });
  });
});
