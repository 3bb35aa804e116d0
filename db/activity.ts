import 'server-only';
import type { Knex } from 'knex';
import type { ActivityRecord } from '@/lib/activity-record';
import type { FieldChange, RevisionAction } from '@/lib/templates/template';
import { db } from './knex';
import { TABLES } from './tables';

/** SQLite's CURRENT_TIMESTAMP ("2026-12-03 07:55:00", UTC) as ISO 8601, so both records sort together. */
function isoUtc(at: string): string {
  return at.includes('T') ? at : `${at.replace(' ', 'T')}.000Z`;
}

function parseDetail(text: string): Record<string, unknown> {
  try {
    const value: unknown = JSON.parse(text);
    return value && typeof value === 'object' ? (value as Record<string, unknown>) : {};
  } catch {
    return {};
  }
}

/** A workspace's activity, newest first (lib/activity-record.ts): the audit log and the template revisions together. */
export async function workspaceActivity(workspaceId: number, limit = 200, knex: Knex = db()): Promise<ActivityRecord[]> {
  const [audits, revisions, buildRevisions] = await Promise.all([
    knex(`${TABLES.auditLog} as a`)
      .leftJoin(`${TABLES.users} as u`, 'u.id', 'a.actor_user_id')
      .where('a.workspace_id', workspaceId)
      .select('a.id', 'a.action', 'a.detail', 'a.created_at', 'u.name as actor_name')
      .orderBy('a.id', 'desc')
      .limit(limit) as Promise<Array<{ id: number; action: string; detail: string; created_at: string; actor_name: string | null }>>,
    knex(`${TABLES.templateRevisions} as r`)
      .join(`${TABLES.templates} as t`, 't.id', 'r.template_id')
      .leftJoin(`${TABLES.users} as u`, 'u.id', 'r.user_id')
      .where('t.workspace_id', workspaceId)
      .select('r.id', 'r.action', 'r.version', 'r.restored_from_version', 'r.changes_json', 'r.created_at', 'r.template_id', 't.name as template_name', 'u.name as actor_name')
      .orderBy('r.id', 'desc')
      .limit(limit) as Promise<
      Array<{
        id: number;
        action: RevisionAction;
        version: number;
        restored_from_version: number | null;
        changes_json: string;
        created_at: string;
        template_id: number;
        template_name: string;
        actor_name: string | null;
      }>
    >,
    knex(`${TABLES.buildRevisions} as r`)
      .join(`${TABLES.builds} as b`, 'b.id', 'r.build_id')
      .leftJoin(`${TABLES.users} as u`, 'u.id', 'r.user_id')
      .where('b.workspace_id', workspaceId)
      .select('r.id', 'r.action', 'r.changes_json', 'r.created_at', 'r.build_id', 'b.customer_name', 'b.engine_description', 'u.name as actor_name')
      .orderBy('r.id', 'desc')
      .limit(limit) as Promise<
      Array<{ id: number; action: 'create' | 'update'; changes_json: string; created_at: string; build_id: number; customer_name: string; engine_description: string; actor_name: string | null }>
    >,
  ]);
  const details = audits.map((row) => parseDetail(row.detail));
  const subjectIds = [...new Set(details.map((d) => d.userId).filter((id): id is number => typeof id === 'number'))];
  const subjects = new Map<number, string>(
    subjectIds.length ? (await knex(TABLES.users).whereIn('id', subjectIds).select('id', 'name')).map((u: { id: number; name: string }) => [u.id, u.name]) : [],
  );
  const records: ActivityRecord[] = [
    ...audits.map((row, i): ActivityRecord => {
      const detail = details[i]!;
      return {
        source: 'audit',
        id: row.id,
        at: isoUtc(row.created_at),
        actorName: row.actor_name,
        action: row.action,
        detail,
        subjectName: typeof detail.userId === 'number' ? (subjects.get(detail.userId) ?? null) : null,
      };
    }),
    ...revisions.map(
      (row): ActivityRecord => ({
        source: 'revision',
        id: row.id,
        at: isoUtc(row.created_at),
        actorName: row.actor_name,
        action: row.action,
        templateId: row.template_id,
        templateName: row.template_name,
        version: row.version,
        restoredFromVersion: row.restored_from_version,
        changes: JSON.parse(row.changes_json) as FieldChange[],
      }),
    ),
    ...buildRevisions.map(
      (row): ActivityRecord => ({
        source: 'build-revision',
        id: row.id,
        at: isoUtc(row.created_at),
        actorName: row.actor_name,
        action: row.action,
        buildId: row.build_id,
        buildName: [row.customer_name, row.engine_description].filter(Boolean).join(', '),
        changes: JSON.parse(row.changes_json) as FieldChange[],
      }),
    ),
  ];
  return records.sort((a, b) => (a.at === b.at ? 0 : a.at < b.at ? 1 : -1)).slice(0, limit);
}
