import 'server-only';
import type { Knex } from 'knex';
import type { PrinterProfile } from '@/lib/printer-profile';
import { db } from './knex';
import { TABLES } from './tables';

type Row = { id: number; name: string; scale_x: number; scale_y: number; created_at: string };

/** Rows as the browser store's profile shape, so one list component shows both. */
function toProfile(row: Row): PrinterProfile {
  return {
    id: String(row.id),
    name: row.name,
    printerScaleX: row.scale_x,
    printerScaleY: row.scale_y,
    createdAt: new Date(row.created_at.replace(' ', 'T') + (row.created_at.includes('T') ? '' : 'Z')).toISOString(),
  };
}

export async function profilesOf(workspaceId: number, knex: Knex = db()): Promise<PrinterProfile[]> {
  const rows: Row[] = await knex(TABLES.printerProfiles).where({ workspace_id: workspaceId }).orderBy('name').orderBy('id');
  return rows.map(toProfile);
}

export async function addProfile(
  workspaceId: number,
  userId: number,
  profile: Pick<PrinterProfile, 'name' | 'printerScaleX' | 'printerScaleY'>,
  knex: Knex = db(),
): Promise<PrinterProfile> {
  const [row] = await knex(TABLES.printerProfiles)
    .insert({
      workspace_id: workspaceId,
      name: profile.name,
      scale_x: profile.printerScaleX,
      scale_y: profile.printerScaleY,
      profile_json: JSON.stringify(profile),
      created_by: userId,
    })
    .returning(['id', 'name', 'scale_x', 'scale_y', 'created_at']);
  return toProfile(row as Row);
}

/** Deletes only inside the given workspace: another workspace's id reads as missing. */
export async function deleteProfile(workspaceId: number, id: number, knex: Knex = db()): Promise<boolean> {
  return (await knex(TABLES.printerProfiles).where({ workspace_id: workspaceId, id }).del()) === 1;
}
