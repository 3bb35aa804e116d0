import type { Knex } from 'knex';
import { databaseConfig } from './db/config';

// DATABASE_URL=postgres://… selects PostgreSQL; unset, the embedded SQLite file (db/config.ts).
const config: Knex.Config = {
  ...databaseConfig(),
  migrations: { directory: './db/migrations', extension: 'ts', loadExtensions: ['.ts'] },
  seeds: { directory: './db/seeds', extension: 'ts', loadExtensions: ['.ts'] },
};

export default config;
