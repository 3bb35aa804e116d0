import type { Knex } from 'knex';
import { staticMigrationSource } from './migration-source';

/** Rows per INSERT: well below PostgreSQL's 65,535 bound parameters for any of our tables. */
const BATCH_ROWS = 500;

export type CopyReport = Array<{ table: string; rows: number }>;

/** The tables of a SQLite database, parents before children (by their foreign keys). */
async function tablesInCopyOrder(sqlite: Knex): Promise<string[]> {
  const tables: Array<{ name: string }> = await sqlite.raw(
    "select name from sqlite_master where type = 'table' and name not like 'sqlite\\_%' escape '\\' and name not like 'knex\\_%' escape '\\' order by name",
  );
  const parents = new Map<string, string[]>();
  for (const { name } of tables) {
    const keys: Array<{ table: string }> = await sqlite.raw(`PRAGMA foreign_key_list(${JSON.stringify(name)})`);
    parents.set(name, keys.map((k) => k.table).filter((t) => t !== name));
  }
  const ordered: string[] = [];
  while (ordered.length < tables.length) {
    const ready = tables.map((t) => t.name).filter((t) => !ordered.includes(t) && parents.get(t)!.every((p) => ordered.includes(p)));
    if (ready.length === 0) throw new Error('The foreign keys of the SQLite database form a cycle; cannot order the copy');
    ordered.push(...ready);
  }
  return ordered;
}

async function pendingMigrations(knex: Knex): Promise<number> {
  const [, pending] = (await knex.migrate.list({ migrationSource: staticMigrationSource })) as [unknown[], unknown[]];
  return pending.length;
}

/**
 * Copies every row of a migrated SQLite database into an empty PostgreSQL database
 * (migrated here first), in one transaction: ids are kept and each id sequence is moved
 * past the highest copied id. Refuses a source with pending migrations and a target
 * that already holds rows.
 */
export async function copySqliteToPostgres(sqlite: Knex, postgres: Knex): Promise<CopyReport> {
  if ((await pendingMigrations(sqlite)) > 0) throw new Error('The SQLite database has pending migrations: run npm run db:migrate on it first');
  await postgres.migrate.latest({ migrationSource: staticMigrationSource });
  const tables = await tablesInCopyOrder(sqlite);
  const report: CopyReport = [];
  await postgres.transaction(async (trx) => {
    // SQLite's CURRENT_TIMESTAMP texts carry no zone and are UTC.
    await trx.raw("SET LOCAL TIME ZONE 'UTC'");
    for (const table of tables) {
      const [counted] = await trx(table).count({ n: '*' });
      if (Number(counted?.n ?? 0) > 0) throw new Error(`The PostgreSQL table ${table} already has rows: copy only into an empty database`);
    }
    for (const table of tables) {
      const rows: Array<Record<string, unknown>> = await sqlite(table).select('*').orderByRaw('rowid');
      for (let start = 0; start < rows.length; start += BATCH_ROWS) await trx(table).insert(rows.slice(start, start + BATCH_ROWS));
      const columns: Array<{ name: string }> = await sqlite.raw(`PRAGMA table_info(${JSON.stringify(table)})`);
      if (columns.some((c) => c.name === 'id')) {
        const serial = await trx.raw<{ rows: Array<{ seq: string | null }> }>('select pg_get_serial_sequence(?, ?) as seq', [table, 'id']);
        const sequence = serial.rows[0]?.seq;
        if (sequence) await trx.raw('select setval(?, coalesce((select max(id) from ??), 0) + 1, false)', [sequence, table]);
      }
      report.push({ table, rows: rows.length });
    }
  });
  return report;
}
