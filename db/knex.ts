import 'server-only';
import knexFactory, { type Knex } from 'knex';
import { databaseConfig } from './config';

const globalForDb = globalThis as unknown as { rimscaleDb?: Knex };

/** The one knex instance of the server process (kept across hot reloads in dev). */
export function db(): Knex {
  globalForDb.rimscaleDb ??= knexFactory(databaseConfig());
  return globalForDb.rimscaleDb;
}

/** Closes the shared instance (tests and scripts that point it at another database). */
export async function closeDb(): Promise<void> {
  await globalForDb.rimscaleDb?.destroy();
  globalForDb.rimscaleDb = undefined;
}
