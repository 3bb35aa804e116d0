import 'server-only';
import { db } from '@/db/knex';
import { TABLES } from '@/db/tables';
import type { BuildRevision } from '@/lib/builds/build';

type RevisionRow = {
  id: number;
  build_id: number;
  version: number;
  action: BuildRevision['action'];
  user_id: number | null;
  user_name: string | null;
  created_at: string;
  changes_json: string;
};

/** A record's revisions, newest first. The caller has already checked the record's workspace. */
export async function listBuildRevisions(buildId: number): Promise<BuildRevision[]> {
  const rows: RevisionRow[] = await db()(`${TABLES.buildRevisions} as r`)
    .leftJoin(`${TABLES.users} as u`, 'u.id', 'r.user_id')
    .where('r.build_id', buildId)
    .orderBy('r.version', 'desc')
    .select('r.*', 'u.name as user_name');
  return rows.map((row) => ({
    id: row.id,
    buildId: row.build_id,
    version: row.version,
    action: row.action,
    user: row.user_id === null ? null : { id: row.user_id, name: row.user_name ?? '' },
    createdAt: row.created_at,
    changes: JSON.parse(row.changes_json),
  }));
}
