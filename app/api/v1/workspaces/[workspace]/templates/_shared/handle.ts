import 'server-only';
import { jsonError } from '@/app/lib/api';
import { accessErrorResponse, NOT_FOUND_MESSAGE } from '@/app/lib/authz';

export type WorkspaceParams = { params: Promise<{ workspace: string }> };
export type TemplateParams = { params: Promise<{ workspace: string; id: string }> };

/**
 * Runs a route handler body: access errors become 401/403/404 in the API's error
 * shape, anything unexpected a 500 without internals.
 */
export async function handle(body: () => Promise<Response>): Promise<Response> {
  try {
    return await body();
  } catch (err) {
    const access = accessErrorResponse(err);
    if (access) return access;
    console.error(err);
    return jsonError(500, 'Something went wrong on the server; nothing was changed');
  }
}

/** A path id: a positive whole number, else null (answered as 404 like a missing template). */
export function parseId(text: string): number | null {
  return /^[1-9]\d{0,15}$/.test(text) ? Number(text) : null;
}

export function templateNotFound(): Response {
  return jsonError(404, NOT_FOUND_MESSAGE);
}
