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

/** The workspace's default profile, or null when it has none. */
export async function defaultProfileOf(workspaceId: number, knex: Knex = db()): Promise<PrinterProfile | null> {
  const row: Row | undefined = await knex(`${TABLES.workspaces} as w`)
    .join(`${TABLES.printerProfiles} as p`, 'p.id', 'w.default_printer_profile_id')
    .where('w.id', workspaceId)
    .first('p.id', 'p.name', 'p.scale_x', 'p.scale_y', 'p.created_at');
  return row ? toProfile(row) : null;
}

/** A profile of the workspace by id, or null (another workspace's id reads as missing). */
export async function findProfile(workspaceId: number, id: number, knex: Knex = db()): Promise<PrinterProfile | null> {
  const row: Row | undefined = await knex(TABLES.printerProfiles).where({ workspace_id: workspaceId, id }).first('id', 'name', 'scale_x', 'scale_y', 'created_at');
  return row ? toProfile(row) : null;
}

/** Makes one of the workspace's profiles its default (null: none); false when the profile is not the workspace's. */
export async function setDefaultProfile(workspaceId: number, profileId: number | null, knex: Knex = db()): Promise<boolean> {
  if (profileId !== null && !(await findProfile(workspaceId, profileId, knex))) return false;
  await knex(TABLES.workspaces).where('id', workspaceId).update({ default_printer_profile_id: profileId });
  return true;
}
