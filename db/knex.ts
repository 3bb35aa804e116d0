import 'server-only';
import fs from 'node:fs';
import path from 'node:path';
import knexFactory, { type Knex } from 'knex';
import { databaseFile, sqliteConfig } from './config';

const globalForDb = globalThis as unknown as { rimscaleDb?: Knex };

/** The one knex instance of the server process (kept across hot reloads in dev). */
export function db(): Knex {
  if (!globalForDb.rimscaleDb) {
    const filename = databaseFile();
    fs.mkdirSync(path.dirname(filename), { recursive: true });
    globalForDb.rimscaleDb = knexFactory(sqliteConfig(filename));
  }
  return globalForDb.rimscaleDb;
}

/** Closes the shared instance (tests and scripts that point it at another file). */
export async function closeDb(): Promise<void> {
  await globalForDb.rimscaleDb?.destroy();
  globalForDb.rimscaleDb = undefined;
}
