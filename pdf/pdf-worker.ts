import { loadSheetFonts } from './fonts';
import { renderPdfJob, type PdfJob } from './pdf-job';

/**
 * The worker-thread entry of the PDF pool (app/lib/pdf-pool.ts). Bundled on its
 * own by scripts/build-pdf-worker.mjs into build/pdf-worker.mjs, because a file
 * inside the Next bundle cannot be started as a worker thread.
 */

// Fonts are read and parsed once per worker, when it starts, not per request.
const fontsReady = loadSheetFonts();

export default async function renderInWorker(job: PdfJob): Promise<Uint8Array> {
  await fontsReady;
  return renderPdfJob(job);
}
