import fs from 'node:fs';
import path from 'node:path';
import type { Knex } from 'knex';
import { databaseFile, sqliteConfig } from './db/config';

// DATABASE_URL is reserved for a future server database; today SQLite is the only engine.
const filename = databaseFile();
fs.mkdirSync(path.dirname(filename), { recursive: true });

const config: Knex.Config = {
  ...sqliteConfig(filename),
  migrations: { directory: './db/migrations', extension: 'ts', loadExtensions: ['.ts'] },
  seeds: { directory: './db/seeds', extension: 'ts', loadExtensions: ['.ts'] },
};

export default config;
