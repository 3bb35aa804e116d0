import 'server-only';
import type { Knex } from 'knex';
import { db } from '@/db/knex';
import type { Build } from '@/lib/builds/build';
import type { BuildFields } from '@/lib/builds/build-fields';
import { rowToBuild, rowToFields, type BuildRow } from './build-row';
import { selectBuilds } from './select-builds';
import { sendsOf } from './sends';

export type StoredBuild = { build: Build; fields: BuildFields; finishedOn: string | null; handedOverOn: string | null };

/** A record of the workspace with its stored fields, or null (a record of another workspace reads as missing). */
export async function findStoredBuild(workspaceId: number, id: number, knex: Knex | Knex.Transaction = db()): Promise<StoredBuild | null> {
  if (!Number.isSafeInteger(id) || id < 1) return null;
  const row: BuildRow | undefined = await selectBuilds(knex, workspaceId).where('b.id', id).first();
  if (!row) return null;
  const sends = (await sendsOf(knex, [id])).get(id) ?? [];
  return { build: rowToBuild(row, sends), fields: rowToFields(row), finishedOn: row.finished_on, handedOverOn: row.handed_over_on };
}

export async function findBuild(workspaceId: number, id: number, knex: Knex | Knex.Transaction = db()): Promise<Build | null> {
  return (await findStoredBuild(workspaceId, id, knex))?.build ?? null;
}
