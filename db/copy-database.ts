import type { Knex } from 'knex';
import { staticMigrationSource } from './migration-source';

/** Rows per INSERT: well below PostgreSQL's 65,535 bound parameters for any of our tables. */
const BATCH_ROWS = 500;

export type CopyReport = Array<{ table: string; rows: number }>;

type CopyPlan = {
  /** Parents before children. */
  tables: string[];
  /** Nullable foreign-key columns written after every table is copied, to break a cycle of references. */
  later: Map<string, string[]>;
};

type ForeignKey = { table: string; from: string };
type ColumnInfo = { name: string; notnull: number };

/**
 * The tables of a SQLite database in an order the foreign keys allow. Where two tables
 * refer to each other (a workspace's default printer profile belongs to the workspace),
 * the nullable reference of one of them is filled in after the copy.
 */
async function planCopy(sqlite: Knex): Promise<CopyPlan> {
  const names: string[] = (
    await sqlite.raw<Array<{ name: string }>>(
      "select name from sqlite_master where type = 'table' and name not like 'sqlite\\_%' escape '\\' and name not like 'knex\\_%' escape '\\' order by name",
    )
  ).map((t) => t.name);
  const keys = new Map<string, Array<ForeignKey & { nullable: boolean }>>();
  for (const name of names) {
    const columns: ColumnInfo[] = await sqlite.raw(`PRAGMA table_info(${JSON.stringify(name)})`);
    const foreign: ForeignKey[] = await sqlite.raw(`PRAGMA foreign_key_list(${JSON.stringify(name)})`);
    keys.set(
      name,
      foreign.filter((k) => k.table !== name).map((k) => ({ ...k, nullable: columns.find((c) => c.name === k.from)?.notnull === 0 })),
    );
  }
  const tables: string[] = [];
  const later = new Map<string, string[]>();
  const waitsFor = (name: string) => keys.get(name)!.filter((k) => !tables.includes(k.table) && !later.get(name)?.includes(k.from));
  while (tables.length < names.length) {
    const left = names.filter((t) => !tables.includes(t));
    const ready = left.filter((t) => waitsFor(t).length === 0);
    if (ready.length > 0) {
      tables.push(...ready);
      continue;
    }
    const breakable = left.find((t) => waitsFor(t).every((k) => k.nullable));
    if (!breakable) throw new Error(`The foreign keys among ${left.join(', ')} form a cycle without a nullable column; cannot order the copy`);
    later.set(breakable, waitsFor(breakable).map((k) => k.from));
  }
  return { tables, later };
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
  const { tables, later } = await planCopy(sqlite);
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
      const deferred = later.get(table) ?? [];
      const firstPass = rows.map((row) => ({ ...row, ...Object.fromEntries(deferred.map((column) => [column, null])) }));
      for (let start = 0; start < rows.length; start += BATCH_ROWS) await trx(table).insert(firstPass.slice(start, start + BATCH_ROWS));
      const columns: Array<{ name: string }> = await sqlite.raw(`PRAGMA table_info(${JSON.stringify(table)})`);
      if (columns.some((c) => c.name === 'id')) {
        const serial = await trx.raw<{ rows: Array<{ seq: string | null }> }>('select pg_get_serial_sequence(?, ?) as seq', [table, 'id']);
        const sequence = serial.rows[0]?.seq;
        if (sequence) await trx.raw('select setval(?, coalesce((select max(id) from ??), 0) + 1, false)', [sequence, table]);
      }
      report.push({ table, rows: rows.length });
    }
    for (const [table, columns] of later) {
      const rows: Array<Record<string, unknown>> = await sqlite(table).select('id', ...columns);
      for (const row of rows.filter((r) => columns.some((c) => r[c] !== null))) {
        await trx(table).where('id', row.id as number).update(Object.fromEntries(columns.map((c) => [c, row[c]])));
      }
    }
  });
  return report;
}
