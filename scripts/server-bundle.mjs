// How server code from lib/ and pdf/ is bundled to run outside Next (the PDF worker, and the
// benchmark that times the sheet code as the server runs it): esbuild, ESM for Node 20,
// packages left in node_modules, `server-only` as an empty module.
import path from 'node:path';
import { build } from 'esbuild';

const root = path.resolve(import.meta.dirname, '..');

/** `server-only` guards the Next bundle; outside it, it is an empty module. */
const serverOnlyIsEmpty = {
  name: 'server-only-is-empty',
  setup(esbuild) {
    esbuild.onResolve({ filter: /^server-only$/ }, () => ({ path: 'server-only', namespace: 'empty' }));
    esbuild.onLoad({ filter: /.*/, namespace: 'empty' }, () => ({ contents: '', loader: 'js' }));
  },
};

/** Bundles `entry` into `outfile` (both relative to the repository); outfile must lie in it, so packages resolve. */
export async function bundleServerCode(entry, outfile) {
  await build({
    entryPoints: [path.join(root, entry)],
    outfile: path.join(root, outfile),
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
  return path.join(root, outfile);
}
