import 'server-only';
import { jsonError, MAX_JSON_BODY_BYTES } from './api';
import { accessErrorResponse } from './authz';
import { crossOriginRefusal } from './same-origin';
import { BodyTooLargeError, bodyLimitedRequest, sizeText } from './request-body';

export const SERVER_ERROR_MESSAGE = 'Something went wrong on the server; nothing was changed';

/** What a state-changing handler takes as its body. `none` allows an empty body only. */
export type BodyKind = 'none' | 'json' | 'multipart' | 'csv' | 'form';

export type WriteOptions = {
  /** Default: no body or JSON. */
  accepts?: BodyKind[];
  /** The most bytes of body read before answering 413 (default: 64 KiB). */
  maxBytes?: number;
  /** The 413 answer in the route's own words (default: "The request body is larger than …"). */
  tooLarge?: () => Response;
};

const MEDIA_TYPES: Record<Exclude<BodyKind, 'none'>, string[]> = {
  json: ['application/json'],
  multipart: ['multipart/form-data'],
  csv: ['text/csv', 'text/tab-separated-values'],
  form: ['application/x-www-form-urlencoded'],
};

type Handler = (request: Request) => Promise<Response>;

/**
 * The one wrapper of every route handler. Reads (`guarded(body)`): access errors become
 * 401/403/404 in the API's error shape; anything unexpected is logged and answered as a 500
 * without internals. State-changing methods (`guarded(request, options, body)`) also refuse,
 * before any work: a request from another origin (403, cross-site request forgery), a body of
 * a type the handler does not take (415: a text/plain form cannot post JSON in disguise) and a
 * body over its limit (413, counted while it streams in, so nothing buffers more than that).
 * The handler gets the size-limited request and must read the body from it.
 */
export async function guarded(body: () => Promise<Response>): Promise<Response>;
export async function guarded(request: Request, options: WriteOptions, body: Handler): Promise<Response>;
export async function guarded(
  first: Request | (() => Promise<Response>),
  options?: WriteOptions,
  body?: Handler,
): Promise<Response> {
  if (typeof first === 'function') return answerErrors(first);
  const request = first;
  const refusal = crossOriginRefusal(request) ?? mediaTypeRefusal(request, options?.accepts ?? ['none', 'json']);
  if (refusal) return refusal;
  const maxBytes = options?.maxBytes ?? MAX_JSON_BODY_BYTES;
  const tooLarge = options?.tooLarge ?? (() => bodyTooLarge(maxBytes));
  if (Number(request.headers.get('content-length') ?? '0') > maxBytes) return tooLarge();
  const limited = framedWithin(request, maxBytes) ? { request, exceeded: () => false } : bodyLimitedRequest(request, maxBytes);
  const response = await answerErrors(() => body!(limited.request), (err) => (limited.exceeded() || err instanceof BodyTooLargeError ? tooLarge() : null));
  return limited.exceeded() && response.status !== 413 ? tooLarge() : response;
}

async function answerErrors(body: () => Promise<Response>, tooLarge: (err: unknown) => Response | null = () => null): Promise<Response> {
  try {
    return await body();
  } catch (err) {
    const access = accessErrorResponse(err);
    if (access) return access;
    // formData() and json() wrap the stream's error in their own; the limiter knows the cause.
    const cutOff = tooLarge(err);
    if (cutOff) return cutOff;
    console.error(err);
    return jsonError(500, SERVER_ERROR_MESSAGE);
  }
}

export function bodyTooLarge(maxBytes: number): Response {
  return jsonError(413, `The request body is larger than ${sizeText(maxBytes)}`, [{ path: '(body)', message: `At most ${sizeText(maxBytes)}` }]);
}

function mediaTypeRefusal(request: Request, accepts: BodyKind[]): Response | null {
  const mediaType = (request.headers.get('content-type') ?? '').split(';')[0]!.trim().toLowerCase();
  const allowed = accepts.flatMap((kind) => (kind === 'none' ? [] : MEDIA_TYPES[kind]));
  if (mediaType === '' ? !hasBody(request) && accepts.includes('none') : allowed.includes(mediaType)) return null;
  const expected = allowed.length > 0 ? allowed.join(' or ') : 'no body';
  return jsonError(415, `This request takes ${expected}${mediaType ? `, not ${mediaType}` : ''}`, [
    { path: '(body)', message: `Content-Type must be ${expected}` },
  ]);
}

/**
 * Whether the body's length is fixed by a declared Content-Length within the limit. Without
 * Transfer-Encoding, Content-Length frames an HTTP/1.1 body (RFC 9112 §6.3), and node's parser ends
 * the body stream there, so it cannot run past the limit and needs no counting wrapper (a stream and
 * a Request object per call, measurable under load).
 */
function framedWithin(request: Request, maxBytes: number): boolean {
  const length = request.headers.get('content-length');
  return length !== null && /^\d+$/.test(length) && Number(length) <= maxBytes && !request.headers.has('transfer-encoding');
}

function hasBody(request: Request): boolean {
  const length = request.headers.get('content-length');
  return request.headers.has('transfer-encoding') || (length !== null && length !== '0');
}
