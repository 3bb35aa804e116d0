/** Calls a route handler module's method the way Next does, with JSON body and params. */
export async function callRoute<P extends Record<string, string>>(
  handler: (req: Request, ctx: { params: Promise<P> }) => Promise<Response>,
  options: { url?: string; method?: string; body?: unknown; params?: P; headers?: Record<string, string> } = {},
): Promise<{ status: number; json: Record<string, unknown> }> {
  const init: RequestInit = { method: options.method ?? 'POST', headers: { ...options.headers } };
  if (options.body !== undefined) {
    init.body = JSON.stringify(options.body);
    (init.headers as Record<string, string>)['content-type'] = 'application/json';
  }
  const response = await handler(new Request(options.url ?? 'http://rimscale.test/api', init), {
    params: Promise.resolve(options.params ?? ({} as P)),
  });
  const text = await response.text();
  return { status: response.status, json: text ? JSON.parse(text) : {} };
}

/** A request as a browser's fetch sends JSON: the content type only when there is a body. */
export function jsonRequest(method: string, url: string, body?: unknown): Request {
  return new Request(url, {
    method,
    headers: body === undefined ? {} : { 'content-type': 'application/json' },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
}

/** The second argument Next hands a route handler: its dynamic segments, as a promise. */
export const routeParams = <T>(value: T) => ({ params: Promise.resolve(value) });
