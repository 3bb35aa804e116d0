import 'server-only';
import { db } from '@/db/knex';
import { TABLES } from '@/db/tables';
import type { RevisionAction, TemplateRevision } from '@/lib/templates/template';
import type { TemplateFields } from '@/lib/templates/template-schema';

type RevisionRow = {
  id: number;
  template_id: number;
  version: number;
  action: RevisionAction;
  restored_from_version: number | null;
  user_id: number | null;
  user_name: string | null;
  created_at: string;
  changes_json: string;
  snapshot_json: string;
};

function selectRevisions(templateId: number) {
  return db()(`${TABLES.templateRevisions} as r`)
    .leftJoin(`${TABLES.users} as u`, 'u.id', 'r.user_id')
    .where('r.template_id', templateId)
    .select('r.*', 'u.name as user_name');
}

function rowToRevision(row: RevisionRow): TemplateRevision {
  return {
    id: row.id,
    templateId: row.template_id,
    version: row.version,
    action: row.action,
    restoredFromVersion: row.restored_from_version,
    user: row.user_id === null ? null : { id: row.user_id, name: row.user_name ?? '' },
    createdAt: row.created_at,
    changes: JSON.parse(row.changes_json),
  };
}

/** A template's revisions, newest first. The caller has already checked the template's workspace. */
export async function listRevisions(templateId: number): Promise<TemplateRevision[]> {
  const rows: RevisionRow[] = await selectRevisions(templateId).orderBy('r.version', 'desc');
  return rows.map(rowToRevision);
}

/** The whole template as it was at `version`, or null. */
export async function revisionSnapshot(templateId: number, version: number): Promise<TemplateFields | null> {
  const row: RevisionRow | undefined = await selectRevisions(templateId).where('r.version', version).first();
  return row ? (JSON.parse(row.snapshot_json) as TemplateFields) : null;
}
