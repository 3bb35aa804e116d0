import 'server-only';
import type { Knex } from 'knex';
import { db } from '@/db/knex';
import { TABLES } from '@/db/tables';
import { diffTemplateFields } from '@/lib/templates/revision-diff';
import type { Template } from '@/lib/templates/template';
import { templateCrossFieldIssues, type TemplateFields } from '@/lib/templates/template-schema';
import { findTemplate } from './find-template';
import { fieldsToColumns } from './template-row';

export type UpdateOutcome =
  | { ok: true; template: Template; changed: boolean }
  | { ok: false; reason: 'not-found' }
  | { ok: false; reason: 'conflict'; current: Template }
  | { ok: false; reason: 'invalid'; issues: Array<{ path: string; message: string }> };

type UpdateOptions = { action?: 'update' | 'restore' | 'import'; restoredFromVersion?: number };

/**
 * Applies `changes` to the template if it is still at `baseVersion`: optimistic
 * concurrency. Inside one transaction the UPDATE carries `WHERE version = ?`, so of
 * two saves from the same version exactly one succeeds and the other is told who
 * changed it and when. A save that changes nothing keeps the version.
 */
export async function updateTemplate(
  workspaceId: number,
  id: number,
  userId: number,
  baseVersion: number,
  changes: Partial<TemplateFields>,
  options: UpdateOptions = {},
): Promise<UpdateOutcome> {
  return db().transaction((trx) => updateTemplateIn(trx, workspaceId, id, userId, baseVersion, changes, options));
}

/** updateTemplate inside the caller's transaction (a CSV import updates many templates in one). */
export async function updateTemplateIn(
  trx: Knex.Transaction,
  workspaceId: number,
  id: number,
  userId: number,
  baseVersion: number,
  changes: Partial<TemplateFields>,
  options: UpdateOptions = {},
): Promise<UpdateOutcome> {
  const current = await findTemplate(workspaceId, id, trx);
  if (!current) return { ok: false, reason: 'not-found' };
  if (current.version !== baseVersion) return { ok: false, reason: 'conflict', current };

  const before: TemplateFields = pickFields(current);
  const after: TemplateFields = { ...before, ...changes };
  const issues = templateCrossFieldIssues(after);
  if (issues.length > 0) return { ok: false, reason: 'invalid', issues };
  const diff = diffTemplateFields(before, after);
  if (diff.length === 0) return { ok: true, template: current, changed: false };

  const at = new Date().toISOString();
  const updated = await trx(TABLES.templates)
    .where({ id, workspace_id: workspaceId, version: baseVersion })
    .update({ ...fieldsToColumns(after), version: baseVersion + 1, updated_by: userId, updated_at: at });
  if (updated !== 1) return { ok: false, reason: 'conflict', current: (await findTemplate(workspaceId, id, trx))! };

  await trx(TABLES.templateRevisions).insert({
    template_id: id,
    version: baseVersion + 1,
    action: options.action ?? 'update',
    restored_from_version: options.restoredFromVersion ?? null,
    user_id: userId,
    created_at: at,
    changes_json: JSON.stringify(diff),
    snapshot_json: JSON.stringify(after),
  });
  return { ok: true, template: (await findTemplate(workspaceId, id, trx))!, changed: true };
}

export function pickFields(t: Template): TemplateFields {
  const { id: _id, version: _v, createdAt: _c, updatedAt: _u, createdBy: _cb, updatedBy: _ub, ...fields } = t;
  return fields;
}
