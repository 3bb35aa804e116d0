import type { Knex } from 'knex';
import { TABLES } from '../tables';
import { creationChanges } from '../../lib/templates/revision-diff';
import type { RevisionAction } from '@/lib/templates/template';
import type { TemplateFields } from '@/lib/templates/template-schema';
import { fieldsToColumns } from './template-row';

/** Rows per INSERT: 20 columns × 500 rows stays far below SQLite's bound-parameter limit. */
const BATCH_ROWS = 500;

export type InsertContext = { workspaceId: number; userId: number | null; at: string; action: Extract<RevisionAction, 'create' | 'import'> };

/**
 * Inserts templates (version 1) and their first revision in batches, inside the
 * caller's transaction. Shared by create, CSV import and the demo seed.
 * Returns the new ids in input order.
 */
export async function insertTemplates(trx: Knex | Knex.Transaction, templates: TemplateFields[], ctx: InsertContext): Promise<number[]> {
  const ids: number[] = [];
  for (let start = 0; start < templates.length; start += BATCH_ROWS) {
    const batch = templates.slice(start, start + BATCH_ROWS);
    const rows = batch.map((t) => ({
      ...fieldsToColumns(t),
      workspace_id: ctx.workspaceId,
      version: 1,
      created_by: ctx.userId,
      updated_by: ctx.userId,
      created_at: ctx.at,
      updated_at: ctx.at,
    }));
    const inserted: Array<{ id: number }> = await trx(TABLES.templates).insert(rows).returning('id');
    // Row ids grow in VALUES order (AUTOINCREMENT); RETURNING's own order is unspecified, so sort.
    const batchIds = inserted.map((r) => r.id).sort((a, b) => a - b);
    await trx(TABLES.templateRevisions).insert(
      batch.map((t, i) => ({
        template_id: batchIds[i],
        version: 1,
        action: ctx.action,
        user_id: ctx.userId,
        created_at: ctx.at,
        changes_json: JSON.stringify(creationChanges(t)),
        snapshot_json: JSON.stringify(t),
      })),
    );
    ids.push(...batchIds);
  }
  return ids;
}
