import 'server-only';
import { db } from '@/db/knex';
import type { TemplateFields } from '@/lib/templates/template-schema';
import { insertTemplates } from './insert-templates';

/** Writes already-validated CSV rows as new templates: all in one transaction, or none. */
export async function importTemplates(workspaceId: number, userId: number, templates: TemplateFields[]): Promise<number[]> {
  return db().transaction((trx) => insertTemplates(trx, templates, { workspaceId, userId, at: new Date().toISOString(), action: 'import' }));
}
