import 'server-only';
import { existsSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { pathToFileURL } from 'node:url';
import Piscina from 'piscina';
import { jsonError } from './api';
import type { PdfJob, RenderedPdf } from '@/pdf/pdf-job';

/**
 * PDF rendering on every core: a pool of worker threads (piscina), one per core,
 * each with its own react-pdf and fonts. The queue in front of them is bounded;
 * when it is full `renderPdf` throws PdfPoolBusy and the route answers 503 with
 * Retry-After instead of letting every caller's wait grow.
 */

/** The worker bundle scripts/build-pdf-worker.mjs writes (`npm run build` and `npm run dev` run it). */
export const PDF_WORKER_FILE = path.join(process.cwd(), 'build', 'pdf-worker.mjs');

const THREADS = Math.max(1, Number(process.env.RIMSCALE_PDF_THREADS) || os.availableParallelism());
/**
 * Jobs that may wait for a free worker: one, whatever the number of workers. An admitted sheet then waits at
 * most for the first worker to come free, so its latency stays within about two drawing times under any load;
 * callers beyond workers + 1 get 503 with Retry-After at once. A longer queue buys no throughput (the workers are
 * already busy), only waiting: by Little's law 16 sheets admitted on 2 workers would each wait ~8 drawing times.
 * The load bench (2 cores): a queue of 1 drew as many sheets a second as a queue of 2, with the p95 of the 200s
 * 3.4 × instead of 4.6 × the one-caller median.
 */
const MAX_QUEUE = Math.max(1, Number(process.env.RIMSCALE_PDF_QUEUE) || 1);

const WORKER_HEAP_MB = Math.max(64, Number(process.env.RIMSCALE_PDF_WORKER_HEAP_MB) || 192);
const WORKER_YOUNG_MB = 16;

export class PdfPoolBusy extends Error {
  constructor(readonly retryAfterS: number) {
    super('Every PDF worker is busy and the queue is full');
  }
}

// One pool per process, wherever Next has loaded this module from.
const POOL = Symbol.for('rimscale.pdf.pool');
type PoolGlobal = typeof globalThis & { [POOL]?: Piscina<PdfJob, RenderedPdf> };

function pool(): Piscina<PdfJob, RenderedPdf> {
  const global = globalThis as PoolGlobal;
  if (global[POOL]) return global[POOL];
  if (!existsSync(PDF_WORKER_FILE)) throw new Error(`PDF worker bundle missing at ${PDF_WORKER_FILE}: run \`node scripts/build-pdf-worker.mjs\` (npm run build does)`);
  global[POOL] = new Piscina<PdfJob, RenderedPdf>({
    filename: pathToFileURL(PDF_WORKER_FILE).href,
    minThreads: THREADS,
    maxThreads: THREADS,
    maxQueue: MAX_QUEUE,
    idleTimeout: 60_000,
    // A ceiling on each worker's heap: the largest sheet (a 600 mm wheel at 0.2 mm pitch, tiled) needs ~80 MB.
    // A worker that passes it is ended and replaced, its memory returned, instead of the process growing.
    // A 16 MB young generation (V8's default is 3 × 16 MB semi-spaces) keeps ~30 MB less resident per worker
    // (two workers after 200 sheets: 312 MB instead of 372 MB). Under `npm start` the process-wide
    // --max-semi-space-size=8 wins over this limit (V8 flags beat per-isolate limits). The trade, measured with the
    // load bench's one-caller run for 10 s: with 8 MB semi-spaces the drawing worker ran ~480 scavenges (~3 ms of
    // pauses per sheet, spread over V8's helper threads); with 32 MB, ~125 (~1.1 ms) and up to 80 sheets/s at 16
    // callers, but the server's peak resident memory rose from ~375 to ~560 MB, past the 450 MB bound.
    resourceLimits: { maxOldGenerationSizeMb: WORKER_HEAP_MB, maxYoungGenerationSizeMb: WORKER_YOUNG_MB },
  });
  return global[POOL];
}

/** Seconds until the queue ahead of a new job should have drained, from the pool's own mean run time. */
function retryAfterS(workers: Piscina): number {
  const { mean } = workers.histogram.runTime; // milliseconds
  const meanMs = Number.isFinite(mean) && mean > 0 ? mean : 50;
  return Math.min(30, Math.max(1, Math.ceil((workers.queueSize * meanMs) / THREADS / 1000)));
}

/** The PDF of a job, rendered in a worker thread. */
export async function renderPdf(job: PdfJob): Promise<RenderedPdf> {
  const workers = pool();
  if (workers.queueSize >= MAX_QUEUE) throw new PdfPoolBusy(retryAfterS(workers));
  try {
    return await workers.run(job);
  } catch (error) {
    if (error instanceof Error && error.message === 'Task queue is at limit') throw new PdfPoolBusy(retryAfterS(workers));
    throw error;
  }
}

/** The API's answer when `error` is a full queue: 503 with Retry-After; null for any other error. */
export function pdfPoolBusyResponse(error: unknown): Response | null {
  if (!(error instanceof PdfPoolBusy)) return null;
  const busy = jsonError(503, 'The server is busy drawing other documents. Try again in a moment.');
  busy.headers.set('Retry-After', String(error.retryAfterS));
  return busy;
}

/** Stops the workers (tests; a server just exits). */
export async function closePdfPool(): Promise<void> {
  const global = globalThis as PoolGlobal;
  const workers = global[POOL];
  global[POOL] = undefined;
  await workers?.close();
}
