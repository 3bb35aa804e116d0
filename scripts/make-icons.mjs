// Draws the app icons in public/ from public/icon.svg with sharp: PNGs for the web app manifest and iOS, and a
// favicon.ico holding a 32 px PNG (an ICO directory entry may point at PNG data, as every current browser reads).
// Run: node scripts/make-icons.mjs (after changing public/icon.svg; commit the output).
import { readFile, writeFile } from 'node:fs/promises';
import path from 'node:path';
import sharp from 'sharp';

const pub = path.resolve(import.meta.dirname, '..', 'public');
const svg = await readFile(path.join(pub, 'icon.svg'));
const png = (size) => sharp(svg, { density: (72 * size) / 32 }).resize(size, size).png({ compressionLevel: 9 }).toBuffer();

for (const [file, size] of [['icon-192.png', 192], ['icon-512.png', 512], ['apple-touch-icon.png', 180]]) {
  await writeFile(path.join(pub, file), await png(size));
}

function ico(pngData, size) {
  const header = Buffer.alloc(6);
  header.writeUInt16LE(0, 0); // reserved
  header.writeUInt16LE(1, 2); // 1 = icon
  header.writeUInt16LE(1, 4); // one image
  const entry = Buffer.alloc(16);
  entry.writeUInt8(size, 0);
  entry.writeUInt8(size, 1);
  entry.writeUInt16LE(1, 4); // colour planes
  entry.writeUInt16LE(32, 6); // bits per pixel
  entry.writeUInt32LE(pngData.length, 8);
  entry.writeUInt32LE(6 + 16, 12); // data offset
  return Buffer.concat([header, entry, pngData]);
}
await writeFile(path.join(pub, 'favicon.ico'), ico(await png(32), 32));
console.log('public/: icon-192.png, icon-512.png, apple-touch-icon.png, favicon.ico');
