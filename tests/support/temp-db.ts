import crypto from 'node:crypto';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import knexFactory, { type Knex } from 'knex';
import { postgresConfig, sqliteConfig, type DatabaseEngine } from '@/db/config';
import { staticMigrationSource } from '@/db/migration-source';

export type TempDb = {
  engine: DatabaseEngine;
  knex: Knex;
  /** Points the app's `db()` at this database (call `closeDb()` first); undone by `cleanup`. */
  useInApp: () => void;
  cleanup: () => Promise<void>;
};

/**
 * The PostgreSQL server the data-layer and API tests run on in their second pass
 * (scripts/test-postgres.sh sets it); unset, they run on SQLite files.
 */
export function testPostgresUrl(): string | undefined {
  return process.env.RIMSCALE_TEST_DATABASE_URL || undefined;
}

/**
 * A fresh database, migrated unless told otherwise: a SQLite file in the system temp
 * folder, or on PostgreSQL a schema of its own (emptied and reused by the next test
 * of the same worker, since creating and migrating a schema costs half a second).
 */
export async function createTempDb(options: { migrate?: boolean } = {}): Promise<TempDb> {
  const migrate = options.migrate !== false;
  const baseUrl = testPostgresUrl();
  if (baseUrl && migrate && idleSchemas.length > 0) return idleSchemas.pop()!;
  const temp = baseUrl ? await createTempSchema(baseUrl, migrate) : createTempFile();
  if (migrate) await temp.knex.migrate.latest({ migrationSource: staticMigrationSource });
  return temp;
}

function createTempFile(): TempDb {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'rimscale-test-'));
  const file = path.join(dir, 'test.sqlite');
  const knex = knexFactory(sqliteConfig(file));
  return {
    engine: 'sqlite',
    knex,
    useInApp: () => {
      process.env.RIMSCALE_DB_FILE = file;
    },
    cleanup: async () => {
      await knex.destroy();
      delete process.env.RIMSCALE_DB_FILE;
      fs.rmSync(dir, { recursive: true, force: true });
    },
  };
}

/** Migrated schemas of this worker, emptied, waiting for the next test. */
const idleSchemas: TempDb[] = [];

async function createTempSchema(baseUrl: string, reusable: boolean): Promise<TempDb> {
  const schema = `test_${crypto.randomBytes(6).toString('hex')}`;
  const admin = knexFactory(postgresConfig(baseUrl));
  try {
    await admin.raw('CREATE SCHEMA ??', [schema]);
  } finally {
    await admin.destroy();
  }
  const url = new URL(baseUrl);
  // Test data need not survive a crash of the server: commits skip the wait for the disk.
  url.searchParams.set('options', `-c search_path=${schema} -c synchronous_commit=off`);
  const knex = knexFactory(postgresConfig(url.toString()));
  const drop = async () => {
    await knex.destroy();
    const dropper = knexFactory(postgresConfig(baseUrl));
    try {
      await dropper.raw('DROP SCHEMA ?? CASCADE', [schema]);
    } finally {
      await dropper.destroy();
    }
  };
  const temp: TempDb = {
    engine: 'postgres',
    knex,
    useInApp: () => {
      process.env.DATABASE_URL = url.toString();
    },
    cleanup: async () => {
      delete process.env.DATABASE_URL;
      if (reusable && (await emptyTables(knex))) idleSchemas.push(temp);
      else await drop();
    },
  };
  return temp;
}

/**
 * Empties every table but knex's own, children before parents (DELETE of a few rows is
 * ten times faster than TRUNCATE here); false if a test changed the schema.
 */
async function emptyTables(knex: Knex): Promise<boolean> {
  try {
    const [done, pending] = (await knex.migrate.list({ migrationSource: staticMigrationSource })) as [unknown[], unknown[]];
    if (pending.length > 0 || done.length === 0) return false;
    const tables = await knex.raw<{ rows: Array<{ name: string }> }>(
      "select tablename as name from pg_tables where schemaname = current_schema() and tablename not like 'knex\\_migrations%'",
    );
    const links = await knex.raw<{ rows: Array<{ child: string; parent: string }> }>(
      "select conrelid::regclass::text as child, confrelid::regclass::text as parent from pg_constraint where contype = 'f' and connamespace = current_schema()::regnamespace",
    );
    let left = tables.rows.map((r) => r.name);
    await knex.transaction(async (trx) => {
      while (left.length > 0) {
        const leaves = left.filter((t) => !links.rows.some((l) => l.parent === t && l.child !== t && left.includes(l.child)));
        if (leaves.length === 0) throw new Error(`foreign keys form a cycle among ${left.join(', ')}`);
        for (const table of leaves) await trx(table).del();
        left = left.filter((t) => !leaves.includes(t));
      }
    });
    return true;
  } catch {
    return false;
  }
}
