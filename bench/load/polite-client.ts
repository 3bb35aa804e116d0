/**
 * A load client that behaves like a well-mannered API caller: `connections` loops, each sending its
 * next request as soon as the previous answer arrives, and after a 503 waiting the Retry-After the
 * server named (RFC 9110 §10.2.3) before trying again. autocannon would resend at once and cannot
 * split latency by status; here the latency of the 200s (what a caller waits for a sheet) and the
 * 503s (the admission bound saying "later") are counted apart, and connection errors apart again.
 */
import http from 'node:http';
import { summarise } from '../stats';
import type { LoadRequest } from './cannon';

export type PoliteFigures = {
  connections: number;
  durationS: number;
  /** 200 answers per second over the run. */
  okPerS: number;
  ok: number;
  /** Latency of the 200 answers only, ms. */
  okMedianMs: number;
  okP95Ms: number;
  okP99Ms: number;
  /** 503 answers (the bounded queue refusing), their median latency and the Retry-After they asked for. */
  busy: number;
  busyMedianMs: number;
  retryAfterS: number[];
  /** Answers other than 200 and 503. */
  otherStatuses: Record<string, number>;
  /** Connection errors and timeouts. */
  errors: number;
};

function send(agent: http.Agent, baseUrl: string, request: LoadRequest): Promise<{ status: number; retryAfter: string | undefined }> {
  return new Promise((resolve, reject) => {
    const req = http.request(new URL(request.path, baseUrl), { method: request.method, headers: request.headers, agent, timeout: 30_000 }, (res) => {
      res.resume(); // read and drop the body: the whole answer must arrive for its latency to count
      res.on('end', () => resolve({ status: res.statusCode ?? 0, retryAfter: res.headers['retry-after'] }));
      res.on('error', reject);
    });
    req.on('timeout', () => req.destroy(new Error('timeout')));
    req.on('error', reject);
    req.end(request.body);
  });
}

const quantile = (sorted: number[], q: number) => (sorted.length ? sorted[Math.min(sorted.length - 1, Math.ceil(q * sorted.length) - 1)]! : NaN);

export async function drivePolitely(baseUrl: string, options: { connections: number; durationS: number; next: () => LoadRequest }): Promise<PoliteFigures> {
  const agent = new http.Agent({ keepAlive: true, maxSockets: options.connections });
  const okMs: number[] = [];
  const busyMs: number[] = [];
  const retryAfterS: number[] = [];
  const otherStatuses: Record<string, number> = {};
  let errors = 0;
  const endAt = performance.now() + options.durationS * 1000;
  const loop = async () => {
    while (performance.now() < endAt) {
      const start = performance.now();
      try {
        const { status, retryAfter } = await send(agent, baseUrl, options.next());
        const ms = performance.now() - start;
        // An answer that arrives after the end of the run is not counted, as autocannon does.
        if (performance.now() > endAt) break;
        if (status === 200) okMs.push(ms);
        else if (status === 503) {
          busyMs.push(ms);
          const waitS = Number(retryAfter) || 1;
          retryAfterS.push(waitS);
          await new Promise((r) => setTimeout(r, Math.min(waitS * 1000, Math.max(0, endAt - performance.now()))));
        } else otherStatuses[status] = (otherStatuses[status] ?? 0) + 1;
      } catch {
        errors += 1;
      }
    }
  };
  await Promise.all(Array.from({ length: options.connections }, loop));
  agent.destroy();
  const ok = [...okMs].sort((a, b) => a - b);
  const timing = ok.length ? summarise(ok) : { medianMs: NaN, p95Ms: NaN };
  return {
    connections: options.connections,
    durationS: options.durationS,
    okPerS: ok.length / options.durationS,
    ok: ok.length,
    okMedianMs: timing.medianMs,
    okP95Ms: timing.p95Ms,
    okP99Ms: quantile(ok, 0.99),
    busy: busyMs.length,
    busyMedianMs: busyMs.length ? summarise(busyMs).medianMs : NaN,
    retryAfterS: [...new Set(retryAfterS)].sort((a, b) => a - b),
    otherStatuses,
    errors,
  };
}
