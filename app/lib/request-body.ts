import 'server-only';

/** Thrown while reading a request body that has passed its limit; the route wrapper answers 413. */
export class BodyTooLargeError extends Error {
  constructor(public maxBytes: number) {
    super(`The request body is larger than ${maxBytes} bytes`);
    this.name = 'BodyTooLargeError';
  }
}

/**
 * The request with a body that stops at `maxBytes`: the bytes are counted as they arrive,
 * and the read fails with BodyTooLargeError (the rest is never pulled) as soon as the count
 * passes the limit, whatever Content-Length says or if it is absent (chunked). `exceeded()`
 * tells afterwards whether that happened, for readers such as formData() that wrap the error.
 */
export function bodyLimitedRequest(request: Request, maxBytes: number): { request: Request; exceeded: () => boolean } {
  if (!request.body) return { request, exceeded: () => false };
  const reader = request.body.getReader();
  let received = 0;
  let over = false;
  const body = new ReadableStream<Uint8Array>({
    async pull(controller) {
      const { done, value } = await reader.read();
      if (done) return controller.close();
      received += value.byteLength;
      if (received > maxBytes) {
        over = true;
        controller.error(new BodyTooLargeError(maxBytes));
        await reader.cancel().catch(() => undefined);
        return;
      }
      controller.enqueue(value);
    },
    cancel: (reason) => reader.cancel(reason),
  });
  const init: RequestInit & { duplex: 'half' } = { method: request.method, headers: request.headers, body, signal: request.signal, duplex: 'half' };
  return { request: new Request(request.url, init), exceeded: () => over };
}

/** The whole body as bytes, at most `maxBytes` of them held (throws BodyTooLargeError past that). */
export async function readBodyBytes(request: Request, maxBytes: number): Promise<Uint8Array> {
  if (!request.body) return new Uint8Array(0);
  const reader = request.body.getReader();
  const chunks: Uint8Array[] = [];
  let received = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    received += value.byteLength;
    if (received > maxBytes) {
      await reader.cancel().catch(() => undefined);
      throw new BodyTooLargeError(maxBytes);
    }
    chunks.push(value);
  }
  return Buffer.concat(chunks);
}

/** A readable size for messages: "64 KiB", "16 MiB". */
export function sizeText(bytes: number): string {
  return bytes >= 1024 * 1024 ? `${Math.round(bytes / (1024 * 1024))} MiB` : `${Math.round(bytes / 1024)} KiB`;
}
