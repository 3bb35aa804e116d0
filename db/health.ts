import 'server-only';
import { db } from './knex';
import { staticMigrationSource } from './migration-source';

export type DatabaseHealth = { ok: true; migrations: number } | { ok: false; reason: string };

/** Answers whether the database can be queried and is fully migrated. */
export async function databaseHealth(): Promise<DatabaseHealth> {
  try {
    const knex = db();
    await knex.raw('select 1');
    const [done, pending] = (await knex.migrate.list({ migrationSource: staticMigrationSource })) as [unknown[], unknown[]];
    if (pending.length > 0) return { ok: false, reason: `${pending.length} migration(s) pending: run npm run db:migrate` };
    return { ok: true, migrations: done.length };
  } catch (err) {
    return { ok: false, reason: err instanceof Error ? err.message : String(err) };
  }
}
