import fs from 'node:fs';
import path from 'node:path';
import type { Knex } from 'knex';
import pg from 'pg';

/** Where the embedded SQLite database lives unless RIMSCALE_DB_FILE says otherwise. */
export const DEFAULT_DB_FILE = path.join('data', 'rimscale.sqlite');

export function databaseFile(): string {
  return process.env.RIMSCALE_DB_FILE || path.join(process.cwd(), DEFAULT_DB_FILE);
}

export type DatabaseEngine = 'sqlite' | 'postgres';

const POSTGRES_URL = /^postgres(ql)?:\/\//i;

/** A server database when DATABASE_URL is set (postgres://…), else the embedded SQLite file. */
export function databaseEngine(): DatabaseEngine {
  const url = process.env.DATABASE_URL?.trim();
  if (!url) return 'sqlite';
  if (POSTGRES_URL.test(url)) return 'postgres';
  throw new Error(`DATABASE_URL must start with postgres:// or postgresql:// (or be unset for the embedded SQLite file); it starts with ${JSON.stringify(url.split(':')[0])}`);
}

/** The knex configuration the app, the knex CLI, the seeds and the scripts all use. */
export function databaseConfig(): Knex.Config {
  if (databaseEngine() === 'postgres') return postgresConfig(process.env.DATABASE_URL!.trim());
  const filename = databaseFile();
  fs.mkdirSync(path.dirname(filename), { recursive: true });
  return sqliteConfig(filename);
}

type PooledConnection = { pragma: (sql: string) => unknown };

/** Every connection gets foreign keys and WAL, so the CLI, the app and the tests behave alike. */
export function sqliteConfig(filename: string): Knex.Config {
  return {
    client: 'better-sqlite3',
    connection: { filename },
    useNullAsDefault: true,
    pool: {
      afterCreate(conn: PooledConnection, done: (err: Error | null, conn: PooledConnection) => void) {
        try {
          conn.pragma('foreign_keys = ON');
          conn.pragma('journal_mode = WAL');
          conn.pragma('busy_timeout = 5000');
          done(null, conn);
        } catch (err) {
          done(err as Error, conn);
        }
      },
    },
  };
}

const { builtins } = pg.types;

/**
 * Rows read the same on both engines: counts (bigint) as numbers and timestamps as
 * ISO strings (SQLite keeps them as text; the code compares and shows them as strings).
 */
function parseLikeSqlite(oid: number, format?: string): (value: string) => unknown {
  if (oid === builtins.INT8) return (value) => Number(value);
  if (oid === builtins.TIMESTAMPTZ || oid === builtins.TIMESTAMP) {
    const toDate = pg.types.getTypeParser(oid, 'text') as (value: string) => Date;
    return (value) => {
      const date = toDate(value);
      return date instanceof Date && !Number.isNaN(date.getTime()) ? date.toISOString() : value;
    };
  }
  return pg.types.getTypeParser(oid, (format ?? 'text') as 'text') as (value: string) => unknown;
}

/** PostgreSQL through `pg`; the pool size is per app instance (DATABASE_POOL_MAX, default 10). */
export function postgresConfig(connectionString: string): Knex.Config {
  return {
    client: 'pg',
    connection: { connectionString, types: { getTypeParser: parseLikeSqlite } } as Knex.PgConnectionConfig,
    pool: { min: 0, max: Number(process.env.DATABASE_POOL_MAX) || 10 },
  };
}
