import { loadSheetFonts } from './fonts';
import { renderPdfJob, type PdfJob, type RenderedPdf } from './pdf-job';

/**
 * The worker-thread entry of the PDF pool (app/lib/pdf-pool.ts). Bundled on its
 * own by scripts/build-pdf-worker.mjs into build/pdf-worker.mjs, because a file
 * inside the Next bundle cannot be started as a worker thread.
 */

// Fonts are read and parsed once per worker, when it starts, not per request.
const fontsReady = loadSheetFonts();

export default async function renderInWorker(job: PdfJob): Promise<RenderedPdf> {
  await fontsReady;
  return renderPdfJob(job);
}
