import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { closeDb } from '@/db/knex';
import { TABLES } from '@/db/tables';
import { insertTemplates } from '@/db/templates/insert-templates';
import { listTemplates } from '@/db/templates/list-templates';
import { templateListQuerySchema } from '@/lib/templates/list-query';
import { EMPTY_TEMPLATE } from '@/lib/templates/template-schema';
import { createTempDb } from '../../support/temp-db';

let temp: Awaited<ReturnType<typeof createTempDb>>;
let workspaceId: number;

const NAMES = ['beta', 'Alpha', 'gamma', 'alpha 2', 'Delta'];
const BORES = [40, null, 38, null, 45];

beforeAll(async () => {
  temp = await createTempDb();
  await closeDb();
  temp.useInApp();
  const [row] = await temp.knex(TABLES.workspaces).insert({ slug: 'list-shop', name: 'List shop', kind: 'shop' }).returning('id');
  workspaceId = (row as { id: number }).id;
  const templates = NAMES.map((name, i) => ({ ...EMPTY_TEMPLATE, name, description: i % 2 ? 'kart engine' : 'moped engine', boreMm: BORES[i]! }));
  await insertTemplates(temp.knex, templates, { workspaceId, userId: null, at: '2026-03-14T00:00:00.000Z', action: 'create' });
});

afterAll(async () => {
  await closeDb();
  await temp.cleanup();
});

const list = (query: Record<string, unknown>) => listTemplates(workspaceId, templateListQuerySchema.parse(query));

describe('listTemplates, paged in SQL', () => {
  it('sorts names without regard to case (the NOCASE index order), ties by id', async () => {
    const page = await list({ sort: 'name' });
    expect(page.items.map((t) => t.name)).toEqual(['Alpha', 'alpha 2', 'beta', 'Delta', 'gamma']);
    expect((await list({ sort: 'name', dir: 'desc' })).items.map((t) => t.name)).toEqual(['gamma', 'Delta', 'beta', 'alpha 2', 'Alpha']);
  });

  it('puts unknown measurements last in either direction', async () => {
    expect((await list({ sort: 'boreMm' })).items.map((t) => t.boreMm)).toEqual([38, 40, 45, null, null]);
    expect((await list({ sort: 'boreMm', dir: 'desc' })).items.map((t) => t.boreMm)).toEqual([45, 40, 38, null, null]);
  });

  it('counts a search’s matches in the same query, on every page, and past the last page', async () => {
    const first = await list({ q: 'kart', sort: 'name', pageSize: 1 });
    expect(first.total).toBe(2);
    expect(first.items.map((t) => t.name)).toEqual(['Alpha']);
    expect((await list({ q: 'kart', sort: 'name', pageSize: 1, page: 2 })).items.map((t) => t.name)).toEqual(['alpha 2']);
    const beyond = await list({ q: 'kart', sort: 'name', pageSize: 1, page: 9 });
    expect(beyond).toMatchObject({ total: 2, items: [] });
    expect((await list({ sort: 'name', pageSize: 2, page: 3 })).total).toBe(5);
  });
});
