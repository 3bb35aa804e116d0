// Bundles pdf/pdf-worker.ts (with lib/ and pdf/) into build/pdf-worker.mjs for the PDF
// worker pool. Turbopack puts route code in chunks a worker thread cannot load, so the
// worker is a plain file of its own; packages (react-pdf, react) stay in node_modules.
// Run before `next build` and `next dev` (the npm scripts do).
import { bundleServerCode } from './server-bundle.mjs';

await bundleServerCode('pdf/pdf-worker.ts', 'build/pdf-worker.mjs');
