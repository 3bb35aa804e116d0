/**
 * pdf-parse bundles its own pdf.js (5.4) beside pdfjs-dist (5.6). In Node both run
 * their "fake worker" from `globalThis.pdfjsWorker` when it is set, and each
 * library picks its worker once, on first use. These helpers make sure each one
 * picks its own, whichever test file runs first.
 */
type WorkerGlobal = typeof globalThis & { pdfjsWorker?: unknown };

export async function withWorkerGlobal<T>(worker: unknown, run: () => Promise<T>): Promise<T> {
  const global = globalThis as WorkerGlobal;
  const previous = global.pdfjsWorker;
  global.pdfjsWorker = worker;
  try {
    return await run();
  } finally {
    global.pdfjsWorker = previous;
  }
}
