import { execFileSync } from 'node:child_process';
import path from 'node:path';

/** Vitest global set-up: the PDF pool's worker bundle, as `npm run build` makes it, before any test renders a PDF. */
export default function buildPdfWorker(): void {
  execFileSync(process.execPath, [path.resolve(import.meta.dirname, '../../scripts/build-pdf-worker.mjs')], { stdio: 'inherit' });
}
