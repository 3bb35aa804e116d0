import fs from 'node:fs';
import path from 'node:path';
import { describe, expect, it, vi } from 'vitest';
import { AccessError } from '@/app/lib/authz';
import { resetAllLimits } from '@/app/lib/rate-limit';
import { createAccessWorld } from '@/tests/support/access-world';
import { useMailFakeForFile } from '@/tests/support/route-test-hooks';
import { ACTION_MATRIX, ACTORS, ROUTE_MATRIX, type Actor, type Method } from '@/tests/support/route-matrix';
import { actAs } from '@/tests/support/session';

vi.mock('@/app/lib/session', () => import('@/tests/support/session'));

const METHODS: Method[] = ['GET', 'POST', 'PUT', 'PATCH', 'DELETE'];
const ROOT = process.cwd();

useMailFakeForFile();

function routeFiles(dir = path.join(ROOT, 'app')): string[] {
  return fs.readdirSync(dir, { withFileTypes: true }).flatMap((entry) => {
    const full = path.join(dir, entry.name);
    if (entry.isDirectory()) return routeFiles(full);
    return entry.name === 'route.ts' ? [path.relative(ROOT, full).split(path.sep).join('/')] : [];
  });
}

function exportedMethods(source: string): Method[] {
  return METHODS.filter(
    (m) => new RegExp(`export\\s+(async\\s+)?function\\s+${m}\\b|export\\s+const\\s+${m}\\b|as\\s+${m}\\b`).test(source),
  );
}

const CHECKS_ACCESS = /@\/app\/lib\/authz|requireAction|requireUser|currentUser/;

function urlFor(file: string, params: Record<string, string>, search = ''): string {
  const route = file
    .replace(/^app/, '')
    .replace(/\/route\.ts$/, '')
    .replace(/\[([^\]]+)\]/g, (_, name: string) => encodeURIComponent(params[name] ?? `missing-${name}`));
  return `http://rimscale.test${route}${search}`;
}

describe('the authorization matrix covers every guarded route', () => {
  it('has a row for every exported method of each workspace-scoped or session-checking route file', () => {
    const missing: string[] = [];
    for (const file of routeFiles()) {
      const source = fs.readFileSync(path.join(ROOT, file), 'utf8');
      if (!file.includes('[workspace]') && !CHECKS_ACCESS.test(source)) continue;
      for (const method of exportedMethods(source)) {
        if (!ROUTE_MATRIX.some((c) => c.file === file && c.method === method)) missing.push(`${method} ${file}`);
      }
    }
    expect(missing, 'add these to tests/support/route-matrix.ts').toEqual([]);
  });

  it('has a row for every exported action of each server-action file that checks access', () => {
    const missing: string[] = [];
    const walk = (dir: string): string[] =>
      fs.readdirSync(dir, { withFileTypes: true }).flatMap((e) =>
        e.isDirectory() ? walk(path.join(dir, e.name)) : /\.tsx?$/.test(e.name) ? [path.join(dir, e.name)] : [],
      );
    for (const full of walk(path.join(ROOT, 'app'))) {
      const source = fs.readFileSync(full, 'utf8');
      if (!/^\s*['"]use server['"]/.test(source) || !CHECKS_ACCESS.test(source)) continue;
      const file = path.relative(ROOT, full).split(path.sep).join('/');
      for (const [, name] of source.matchAll(/export\s+async\s+function\s+(\w+)/g)) {
        if (!ACTION_MATRIX.some((c) => c.file === file && c.name === name)) missing.push(`${name} in ${file}`);
      }
    }
    expect(missing, 'add these to ACTION_MATRIX in tests/support/route-matrix.ts').toEqual([]);
  });

  it('reads each workspace route\'s expectations from the policy action its handler asks for', () => {
    const unread: string[] = [];
    for (const c of ROUTE_MATRIX.filter((row) => row.file.includes('[workspace]'))) {
      const source = fs.readFileSync(path.join(ROOT, c.file), 'utf8');
      if (!c.action || !source.includes(`'${c.action}'`)) unread.push(`${c.method} ${c.file} (${c.action ?? 'no action'})`);
    }
    expect(unread, 'give these rows ...guardedBy(action, status) with the action the handler passes to requireAction').toEqual([]);
  });

  it('names only route files that exist, each method once', () => {
    const seen = new Set<string>();
    for (const c of ROUTE_MATRIX) {
      expect(fs.existsSync(path.join(ROOT, c.file)), c.file).toBe(true);
      const key = `${c.method} ${c.file}`;
      expect(seen.has(key), `${key} listed twice`).toBe(false);
      seen.add(key);
    }
  });
});

async function runRoute(row: (typeof ROUTE_MATRIX)[number], actor: Actor): Promise<{ status: number; body: string }> {
  const world = await createAccessWorld();
  await resetAllLimits();
  try {
    const call = (await row.call?.(world, actor)) ?? {};
    const params = { workspace: world.shop.slug, ...call.params };
    actAs(actor === 'signedOut' ? null : world.users[actor].id);
    const mod = (await import(/* @vite-ignore */ path.join(ROOT, row.file))) as Record<string, unknown>;
    const handler = mod[row.method] as (req: Request, ctx: { params: Promise<Record<string, string>> }) => Promise<Response>;
    const init: RequestInit = { method: row.method };
    if (call.body !== undefined) {
      init.body = JSON.stringify(call.body);
      init.headers = { 'content-type': 'application/json' };
    }
    if (call.raw) {
      init.body = call.raw.body;
      init.headers = { 'content-type': call.raw.type };
    }
    const response = await handler(new Request(urlFor(row.file, params, call.search), init), { params: Promise.resolve(params) });
    return { status: response.status, body: await response.text() };
  } finally {
    actAs(null);
    await world.cleanup();
  }
}

describe.each(ROUTE_MATRIX.map((row) => [`${row.method} ${row.file.replace(/^app\/api/, '/api').replace(/\/route\.ts$/, '')}`, row] as const))(
  '%s',
  (_name, row) => {
    it.each(ACTORS.map((actor) => [actor, row.expected[actor]] as const))('%s → %i', async (actor, expected) => {
      const { status, body } = await runRoute(row, actor);
      expect(status, body).toBe(expected);
      if (expected === 404) {
        // A foreign workspace's answer must not carry its data: only the error shape.
        expect(Object.keys(JSON.parse(body)).sort()).toEqual(['error', 'issues']);
      }
    });
  },
);

describe.each(ACTION_MATRIX.map((row) => [`${row.name} (${row.file})`, row] as const))('action %s', (_name, row) => {
  it.each(ACTORS.map((actor) => [actor, row.expected[actor]] as const))('%s → %i', async (actor, expected) => {
    const world = await createAccessWorld();
    try {
      const args = await row.args(world, actor);
      actAs(actor === 'signedOut' ? null : world.users[actor].id);
      const mod = (await import(/* @vite-ignore */ path.join(ROOT, row.file))) as Record<string, (...a: unknown[]) => Promise<unknown>>;
      let status: number;
      try {
        const result = await mod[row.name]!(...args);
        status = row.statusOf?.(result) ?? ((result as { status?: number } | null)?.status ?? 200);
      } catch (err) {
        if (!(err instanceof AccessError)) throw err;
        status = err.status;
      }
      expect(status).toBe(expected);
    } finally {
      actAs(null);
      await world.cleanup();
    }
  });
});
