import type { Knex } from 'knex';
import * as createAccounts from './migrations/20261201000000_create_accounts';
import * as createAccountRecords from './migrations/20261201000100_create_account_records';
import * as createPrinterProfiles from './migrations/20261201000200_create_printer_profiles';
import * as createTemplates from './migrations/20261201000600_create_templates';
import * as addSessionVersion from './migrations/20261201001500_add_session_version';
import * as createBuilds from './migrations/20261203000900_create_builds';
import * as addDefaultPrinterProfile from './migrations/20261203001000_add_default_printer_profile';
import * as createBuildPhotos from './migrations/20261203001100_create_build_photos';
import * as createImportReceipts from './migrations/20261203110000_create_import_receipts';
import * as templateListSortIndexes from './migrations/20261203001400_template_list_sort_indexes';

type Migration = { up: (knex: Knex) => Promise<void>; down: (knex: Knex) => Promise<void> };

/**
 * Inside the Next bundle knex cannot read the migrations folder, so the app lists
 * them here. Names match the files (extension included) so the CLI and the app
 * agree on what has run. Add each new migration to this list.
 */
const MIGRATIONS: Record<string, Migration> = {
  '20261201000000_create_accounts.ts': createAccounts,
  '20261201000100_create_account_records.ts': createAccountRecords,
  '20261201000200_create_printer_profiles.ts': createPrinterProfiles,
  '20261201000600_create_templates.ts': createTemplates,
  '20261201001500_add_session_version.ts': addSessionVersion,
  '20261203000900_create_builds.ts': createBuilds,
  '20261203001000_add_default_printer_profile.ts': addDefaultPrinterProfile,
  '20261203001100_create_build_photos.ts': createBuildPhotos,
  '20261203110000_create_import_receipts.ts': createImportReceipts,
  '20261203001400_template_list_sort_indexes.ts': templateListSortIndexes,
};

export const staticMigrationSource: Knex.MigrationSource<string> = {
  getMigrations: async () => Object.keys(MIGRATIONS).sort(),
  getMigrationName: (name) => name,
  getMigration: async (name) => {
    const migration = MIGRATIONS[name];
    if (!migration) throw new Error(`Unknown migration ${name}`);
    return migration;
  },
};
