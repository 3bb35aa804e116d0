// The node flags `npm start` gives scripts/server.mjs: the words between `node` and the script in package.json's
// start script, so the demo and the load bench run the server exactly as it is run. Run directly, it prints them.
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

export function startNodeFlags() {
  const { scripts } = JSON.parse(readFileSync(path.join(process.cwd(), 'package.json'), 'utf8'));
  const words = scripts.start.split(/\s+/);
  return words.slice(words.indexOf('node') + 1, words.indexOf('scripts/server.mjs'));
}

if (process.argv[1] === fileURLToPath(import.meta.url)) console.log(startNodeFlags().join(' '));
