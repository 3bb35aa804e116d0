import 'server-only';
import { jsonError } from './api';
import { accessErrorResponse } from './authz';

export const SERVER_ERROR_MESSAGE = 'Something went wrong on the server; nothing was changed';

/**
 * Runs a route handler body: access errors become 401/403/404 in the API's error shape;
 * anything unexpected is logged here and answered as a 500 without internals.
 */
export async function guarded(body: () => Promise<Response>): Promise<Response> {
  try {
    return await body();
  } catch (err) {
    const access = accessErrorResponse(err);
    if (access) return access;
    console.error(err);
    return jsonError(500, SERVER_ERROR_MESSAGE);
  }
}
