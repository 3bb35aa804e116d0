import 'server-only';
import { jsonError } from '@/app/lib/api';
import { NOT_FOUND_MESSAGE } from '@/app/lib/authz';

export type WorkspaceParams = { params: Promise<{ workspace: string }> };
export type TemplateParams = { params: Promise<{ workspace: string; id: string }> };

/** A path id: a positive whole number, else null (answered as 404 like a missing template). */
export function parseId(text: string): number | null {
  return /^[1-9]\d{0,15}$/.test(text) ? Number(text) : null;
}

export function templateNotFound(): Response {
  return jsonError(404, NOT_FOUND_MESSAGE);
}
