import fs from 'node:fs';
import path from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { staticMigrationSource } from '@/db/migration-source';
import { TABLES } from '@/db/tables';
import { createTempDb } from '@/tests/support/temp-db';

let cleanup: (() => Promise<void>) | undefined;
afterEach(async () => {
  await cleanup?.();
  cleanup = undefined;
});

describe('migrations', () => {
  it('lists every file of db/migrations in the static source the app uses', async () => {
    const files = fs
      .readdirSync(path.join(process.cwd(), 'db/migrations'))
      .filter((f) => f.endsWith('.ts'))
      .sort();
    expect(await staticMigrationSource.getMigrations([])).toEqual(files);
  });

  it('migrates a fresh database up with foreign keys enforced, and all the way down again', async () => {
    const temp = await createTempDb();
    cleanup = temp.cleanup;
    const { knex } = temp;
    expect(await knex.schema.hasTable(TABLES.users)).toBe(true);
    expect(await knex.schema.hasTable(TABLES.memberships)).toBe(true);
    if (temp.engine === 'sqlite') {
      expect((await knex.raw('PRAGMA foreign_keys'))[0].foreign_keys).toBe(1);
      expect((await knex.raw('PRAGMA journal_mode'))[0].journal_mode).toBe('wal');
    }

    // With foreign keys on, a membership cannot point at a missing user (SQLite: "FOREIGN KEY
    // constraint failed"; PostgreSQL: "violates foreign key constraint").
    await expect(knex(TABLES.memberships).insert({ user_id: 999, workspace_id: 999, role: 'owner' })).rejects.toThrow(
      /foreign key/i,
    );

    await knex.migrate.rollback({ migrationSource: staticMigrationSource }, true);
    expect(await knex.schema.hasTable(TABLES.users)).toBe(false);
  });
});
