import 'server-only';
import { db } from '@/db/knex';
import type { Template } from '@/lib/templates/template';
import type { TemplateFields } from '@/lib/templates/template-schema';
import { findTemplate } from './find-template';
import { insertTemplates } from './insert-templates';

export async function createTemplate(workspaceId: number, userId: number, fields: TemplateFields): Promise<Template> {
  return db().transaction(async (trx) => {
    const [id] = await insertTemplates(trx, [fields], { workspaceId, userId, at: new Date().toISOString(), action: 'create' });
    return (await findTemplate(workspaceId, id!, trx))!;
  });
}
