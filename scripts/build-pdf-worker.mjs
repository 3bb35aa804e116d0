// Bundles pdf/pdf-worker.ts (with lib/ and pdf/) into build/pdf-worker.mjs for the PDF
// worker pool. Turbopack puts route code in chunks a worker thread cannot load, so the
// worker is a plain file of its own; packages (react-pdf, react) stay in node_modules.
// Run before `next build` and `next dev` (the npm scripts do).
import path from 'node:path';
import { build } from 'esbuild';

const root = path.resolve(import.meta.dirname, '..');

/** `server-only` guards the Next bundle; in the worker thread it is an empty module. */
const serverOnlyIsEmpty = {
  name: 'server-only-is-empty',
  setup(esbuild) {
    esbuild.onResolve({ filter: /^server-only$/ }, () => ({ path: 'server-only', namespace: 'empty' }));
    esbuild.onLoad({ filter: /.*/, namespace: 'empty' }, () => ({ contents: '', loader: 'js' }));
  },
};

await build({
  entryPoints: [path.join(root, 'pdf', 'pdf-worker.ts')],
  outfile: path.join(root, 'build', 'pdf-worker.mjs'),
  bundle: true,
  platform: 'node',
  format: 'esm',
  target: 'node20',
  packages: 'external',
  jsx: 'automatic',
  tsconfig: path.join(root, 'tsconfig.json'),
  plugins: [serverOnlyIsEmpty],
  logLevel: 'warning',
});
