import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import knexFactory, { type Knex } from 'knex';
import { sqliteConfig } from '@/db/config';
import { staticMigrationSource } from '@/db/migration-source';

/** A fresh SQLite file in the system temp folder, migrated unless told otherwise. */
export async function createTempDb(options: { migrate?: boolean } = {}): Promise<{
  file: string;
  knex: Knex;
  cleanup: () => Promise<void>;
}> {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'rimscale-test-'));
  const file = path.join(dir, 'test.sqlite');
  const knex = knexFactory(sqliteConfig(file));
  if (options.migrate !== false) await knex.migrate.latest({ migrationSource: staticMigrationSource });
  return {
    file,
    knex,
    cleanup: async () => {
      await knex.destroy();
      fs.rmSync(dir, { recursive: true, force: true });
    },
  };
}
