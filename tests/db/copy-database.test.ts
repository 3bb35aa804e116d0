import { afterEach, describe, expect, it } from 'vitest';
import { copySqliteToPostgres } from '@/db/copy-database';
import { seed as seedShop } from '@/db/seeds/01_demo_shop';
import { seed as seedTemplates } from '@/db/seeds/02_demo_templates';
import { seed as seedBuilds } from '@/db/seeds/03_demo_builds';
import { TABLES } from '@/db/tables';
import { createTempDb, testPostgresUrl, type TempDb } from '../support/temp-db';

if (!testPostgresUrl()) throw new Error('Run this file in the PostgreSQL pass: bash scripts/test-postgres.sh');

const made: TempDb[] = [];
afterEach(async () => {
  for (const temp of made.splice(0)) await temp.cleanup();
});

/** Temp databases of both engines: the SQLite one regardless of the pass, the other on PostgreSQL. */
async function sqliteWithDemoData(): Promise<TempDb> {
  const saved = process.env.RIMSCALE_TEST_DATABASE_URL;
  delete process.env.RIMSCALE_TEST_DATABASE_URL;
  try {
    const temp = await createTempDb();
    made.push(temp);
    await seedShop(temp.knex);
    await seedTemplates(temp.knex);
    await seedBuilds(temp.knex);
    return temp;
  } finally {
    if (saved !== undefined) process.env.RIMSCALE_TEST_DATABASE_URL = saved;
  }
}

async function emptyPostgres(): Promise<TempDb> {
  const temp = await createTempDb({ migrate: false });
  made.push(temp);
  return temp;
}

/** Rows compared by value, whatever each engine's types: booleans as 0/1, timestamps as instants. */
function comparable(row: Record<string, unknown>): Record<string, unknown> {
  return Object.fromEntries(
    Object.entries(row).map(([key, value]) => {
      if (typeof value === 'boolean') return [key, value ? 1 : 0];
      if (typeof value === 'string' && /^\d{4}-\d\d-\d\d[ T]\d\d:\d\d:\d\d/.test(value)) {
        return [key, new Date(/[zZ]|[+-]\d\d:?\d\d$/.test(value) ? value : `${value.replace(' ', 'T')}Z`).toISOString()];
      }
      return [key, value];
    }),
  );
}

describe('copying the demo shop from SQLite to PostgreSQL (npm run db:copy-to-postgres)', () => {
  it('copies every row of every table unchanged, and new rows get fresh ids afterwards', async () => {
    const sqlite = await sqliteWithDemoData();
    // Workspaces and printer profiles refer to each other: the copy must fill this in after both exist.
    const profile = await sqlite.knex(TABLES.printerProfiles).first();
    await sqlite.knex(TABLES.workspaces).where({ id: profile.workspace_id }).update({ default_printer_profile_id: profile.id });
    const postgres = await emptyPostgres();
    const report = await copySqliteToPostgres(sqlite.knex, postgres.knex);
    const copiedShop = await postgres.knex(TABLES.workspaces).where({ id: profile.workspace_id }).first();
    expect(copiedShop.default_printer_profile_id).toBe(profile.id);

    const templates = report.find((r) => r.table === TABLES.templates);
    expect(templates?.rows).toBe(12);
    for (const { table } of report) {
      const before = (await sqlite.knex(table).select('*')).map(comparable);
      const after = (await postgres.knex(table).select('*')).map(comparable);
      const key = (r: Record<string, unknown>) => String(r.id ?? r.key);
      expect(after.sort((x, y) => key(x).localeCompare(key(y))), table).toEqual(before.sort((x, y) => key(x).localeCompare(key(y))));
    }
    // Users are parents of memberships: had the order been wrong, the foreign keys would have refused.
    expect(report.findIndex((r) => r.table === TABLES.users)).toBeLessThan(report.findIndex((r) => r.table === TABLES.memberships));

    const maxId = Number((await postgres.knex(TABLES.templates).max({ m: 'id' }))[0]!.m);
    const shop = await postgres.knex(TABLES.workspaces).where({ slug: 'harbour-lane' }).first();
    const [inserted] = await postgres.knex(TABLES.workspaces).insert({ slug: 'after-copy', name: 'After copy', kind: 'shop' }).returning('id');
    expect(inserted.id).toBeGreaterThan(shop.id);
    expect(maxId).toBe(Number((await sqlite.knex(TABLES.templates).max({ m: 'id' }))[0]!.m));
  });

  it('refuses to copy into a database that already has rows, and writes nothing', async () => {
    const sqlite = await sqliteWithDemoData();
    const postgres = await emptyPostgres();
    await copySqliteToPostgres(sqlite.knex, postgres.knex);
    await expect(copySqliteToPostgres(sqlite.knex, postgres.knex)).rejects.toThrow(/already has rows/);
    expect(Number((await postgres.knex(TABLES.templates).count({ n: '*' }))[0]!.n)).toBe(12);
  });
});
