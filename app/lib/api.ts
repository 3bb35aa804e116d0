import 'server-only';
import type { z } from 'zod';
import { toFieldIssues, type FieldIssue } from '@/lib/sheet/sheet-request';
import { BodyTooLargeError, readBodyBytes, sizeText } from './request-body';

/** JSON bodies above this are refused while they are read. */
export const MAX_JSON_BODY_BYTES = 64 * 1024;


export type ApiErrorBody = { error: string; issues: FieldIssue[] };

export function jsonError(status: number, error: string, issues: FieldIssue[] = []): Response {
  const body: ApiErrorBody = { error, issues };
  return Response.json(body, { status });
}

type Parsed<T> = { ok: true; data: T } | { ok: false; response: Response };

/**
 * Reads a JSON request body with a size cap and validates it with `schema`.
 * Every failure becomes a 400 (or 413) in the API's error shape, never a throw.
 */
export async function parseJsonBody<S extends z.ZodType>(
  request: Request,
  schema: S,
  maxBytes = MAX_JSON_BODY_BYTES,
): Promise<Parsed<z.output<S>>> {
  const declared = Number(request.headers.get('content-length') ?? '0');
  if (declared > maxBytes) return { ok: false, response: tooLarge(maxBytes) };
  let bytes: Uint8Array;
  try {
    // Read while counting: a chunked body without Content-Length stops at the limit too.
    bytes = await readBodyBytes(request, maxBytes);
  } catch (err) {
    if (err instanceof BodyTooLargeError) return { ok: false, response: tooLarge(maxBytes) };
    throw err;
  }
  let json: unknown;
  try {
    json = JSON.parse(new TextDecoder().decode(bytes));
  } catch {
    return { ok: false, response: jsonError(400, 'The request body is not valid JSON', [{ path: '(body)', message: 'Send a JSON object' }]) };
  }
  const result = schema.safeParse(json);
  if (!result.success) return { ok: false, response: jsonError(400, 'Some fields are not valid', toFieldIssues(result.error)) };
  return { ok: true, data: result.data };
}

function tooLarge(maxBytes: number): Response {
  return jsonError(413, `The request body is larger than ${sizeText(maxBytes)}`, [{ path: '(body)', message: `At most ${sizeText(maxBytes)} of JSON` }]);
}
