/** One autocannon run against the server, summarised as the figures the load benchmark reports. */
import autocannon from 'autocannon';
import { summarise } from '../stats';

export type LoadRequest = { method: 'GET' | 'POST'; path: string; headers?: Record<string, string>; body?: string };

export type LoadFigures = {
  connections: number;
  durationS: number;
  requests: number;
  requestsPerS: number;
  medianMs: number;
  p95Ms: number;
  p99Ms: number;
  errors: number; // connection errors and timeouts
  statuses: Record<string, number>;
  bodyBytesPerResponse: number;
};

/** Runs `next()`'s requests on `connections` connections for `durationS` seconds; latency of every answer, any status. */
export async function drive(baseUrl: string, options: { connections: number; durationS: number; next: () => LoadRequest }): Promise<LoadFigures> {
  const latenciesMs: number[] = [];
  const statuses: Record<string, number> = {};
  let responseBytes = 0;
  const instance = autocannon({
    url: baseUrl,
    connections: options.connections,
    duration: options.durationS,
    timeout: 30,
    requests: [
      {
        setupRequest: (request: autocannon.Request) => {
          const next = options.next();
          return { ...request, ...next, headers: { ...request.headers, ...next.headers } };
        },
      },
    ],
  });
  instance.on('response', (_client: unknown, statusCode: number, resBytes: number, responseTimeMs: number) => {
    latenciesMs.push(responseTimeMs);
    statuses[statusCode] = (statuses[statusCode] ?? 0) + 1;
    responseBytes += resBytes;
  });
  const result = await instance;
  const timing = latenciesMs.length ? summarise(latenciesMs) : { medianMs: NaN, p95Ms: NaN };
  const sorted = [...latenciesMs].sort((a, b) => a - b);
  const p99Ms = sorted.length ? sorted[Math.min(sorted.length - 1, Math.ceil(0.99 * sorted.length) - 1)]! : NaN;
  return {
    connections: options.connections,
    durationS: options.durationS,
    requests: latenciesMs.length,
    requestsPerS: latenciesMs.length / options.durationS,
    medianMs: timing.medianMs,
    p95Ms: timing.p95Ms,
    p99Ms,
    errors: result.errors + result.timeouts,
    statuses,
    bodyBytesPerResponse: latenciesMs.length ? responseBytes / latenciesMs.length : 0,
  };
}
