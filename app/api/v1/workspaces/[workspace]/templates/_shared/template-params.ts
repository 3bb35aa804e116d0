import 'server-only';
import { jsonError } from '@/app/lib/api';
import { NOT_FOUND_MESSAGE } from '@/app/lib/authz';

export type WorkspaceParams = { params: Promise<{ workspace: string }> };
export type TemplateParams = { params: Promise<{ workspace: string; id: string }> };

export function templateNotFound(): Response {
  return jsonError(404, NOT_FOUND_MESSAGE);
}
