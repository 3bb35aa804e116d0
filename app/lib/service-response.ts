import 'server-only';
import type { ServiceResult } from './account-service';
import { jsonError } from './api';

/** A service result as a route response: the value as JSON with `status`, or the refusal in the API error shape. */
export function serviceResponse<T>(result: ServiceResult<T>, status = 200, body?: (value: T) => unknown): Response {
  if (!result.ok) return jsonError(result.status, result.message);
  if (status === 204) return new Response(null, { status });
  return Response.json(body ? body(result.value) : result.value, { status });
}
