// Makes the WOFF2 subsets the pages use (fonts/web/) from the DejaVu TTFs in fonts/, which stay whole for the PDFs.
// The subset holds printable ASCII, Latin-1, the signs the pages must show (° − → ± ✓ and friends) and every other
// character found in the UI's source, so a new label cannot silently fall back to another font.
// Run: node scripts/make-web-fonts.mjs (after changing UI text with new symbols; commit the output).
import { readdir, readFile, writeFile } from 'node:fs/promises';
import path from 'node:path';
import subsetFont from 'subset-font';

const root = path.resolve(import.meta.dirname, '..');
const SOURCE_DIRS = ['app', 'components', 'lib'];
const REQUIRED = '°−→±✓×≈·π⌀Ø⇄◔≡▲▼↕–—‘’“”…•′″½¼¾≤≥';
const FONTS = [
  ['DejaVuSans.ttf', 'DejaVuSans-web.woff2'],
  ['DejaVuSans-Bold.ttf', 'DejaVuSans-Bold-web.woff2'],
  ['DejaVuSansMono.ttf', 'DejaVuSansMono-web.woff2'],
];

function range(from, to) {
  return Array.from({ length: to - from + 1 }, (_, i) => String.fromCodePoint(from + i)).join('');
}

async function sourceCharacters() {
  const found = new Set();
  for (const dir of SOURCE_DIRS) {
    for (const entry of await readdir(path.join(root, dir), { recursive: true, withFileTypes: true })) {
      if (!entry.isFile() || !/\.(tsx?|css)$/.test(entry.name)) continue;
      for (const char of await readFile(path.join(entry.parentPath, entry.name), 'utf8')) if (char.codePointAt(0) > 0x7f) found.add(char);
    }
  }
  return [...found].join('');
}

const text = range(0x20, 0x7e) + range(0xa0, 0xff) + REQUIRED + (await sourceCharacters());
for (const [from, to] of FONTS) {
  const subset = await subsetFont(await readFile(path.join(root, 'fonts', from)), text, { targetFormat: 'woff2' });
  await writeFile(path.join(root, 'fonts', 'web', to), subset);
  console.log(`fonts/web/${to}: ${subset.length} bytes`);
}
