import 'server-only';
import { parsePathId } from '@/lib/path-id';
import { AccessError, NOT_FOUND_MESSAGE, requireAction, type Access } from '@/app/lib/authz';
import { findTemplate } from '@/db/templates/find-template';
import type { Template } from '@/lib/templates/template';
import type { Action } from '@/lib/access-policy';
import {} from './template-params';

/**
 * The template named by the path, for a caller whose role may do `action` in its workspace.
 * A bad id or a template of another workspace throws the same 404 as a missing workspace.
 */
export async function templateFor(
  params: Promise<{ workspace: string; id: string }>,
  action: Action,
): Promise<{ access: Access; template: Template }> {
  const { workspace, id } = await params;
  const access = await requireAction(workspace, action);
  const templateId = parsePathId(id);
  const template = templateId ? await findTemplate(access.workspace.id, templateId) : null;
  if (!template) throw new AccessError(404, NOT_FOUND_MESSAGE);
  return { access, template };
}
