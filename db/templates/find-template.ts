import 'server-only';
import type { Knex } from 'knex';
import { db } from '@/db/knex';
import type { Template } from '@/lib/templates/template';
import { selectTemplates } from './select-templates';
import { rowToTemplate, type TemplateRow } from './template-row';

/** A template of the workspace, or null (a template of another workspace reads as missing). */
export async function findTemplate(workspaceId: number, id: number, knex: Knex | Knex.Transaction = db()): Promise<Template | null> {
  if (!Number.isSafeInteger(id) || id < 1) return null;
  const row: TemplateRow | undefined = await selectTemplates(knex, workspaceId).where('t.id', id).first();
  return row ? rowToTemplate(row) : null;
}
