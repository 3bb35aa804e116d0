import 'server-only';
import { membersOf } from '@/db/accounts';
import { workspaceToleranceDeg } from '@/db/builds/references';
import { db } from '@/db/knex';
import { listTemplates } from '@/db/templates/list-templates';
import type { Template } from '@/lib/templates/template';

/** What the build pages need beside the record: the templates to start from, the people, the tolerance. */
export async function buildPageData(workspaceId: number): Promise<{ templates: Template[]; technicians: Array<{ id: number; name: string }>; toleranceDeg: number }> {
  const [templates, members, toleranceDeg] = await Promise.all([
    listTemplates(workspaceId, { q: '', sort: 'name', dir: 'asc', archived: 'false', page: 1, pageSize: 100 }),
    membersOf(workspaceId),
    workspaceToleranceDeg(db(), workspaceId),
  ]);
  return { templates: templates.items, technicians: members.map((m) => ({ id: m.userId, name: m.name })), toleranceDeg };
}
