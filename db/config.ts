import path from 'node:path';
import type { Knex } from 'knex';

/** Where the embedded SQLite database lives unless RIMSCALE_DB_FILE says otherwise. */
export const DEFAULT_DB_FILE = path.join('data', 'rimscale.sqlite');

export function databaseFile(): string {
  return process.env.RIMSCALE_DB_FILE || path.join(process.cwd(), DEFAULT_DB_FILE);
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
