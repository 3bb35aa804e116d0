// The web fonts app/fonts.ts serves (fonts/web/, made by scripts/make-web-fonts.mjs), read by fontkit, an
// independent font parser from the npm registry: every sign the pages show has a glyph, and the files stay small.
import { readdirSync, readFileSync, statSync } from 'node:fs';
import path from 'node:path';
import { openSync } from 'fontkit';
import { describe, expect, it } from 'vitest';

const root = path.resolve(__dirname, '../..');
const WEB_FONTS = ['DejaVuSans-web.woff2', 'DejaVuSans-Bold-web.woff2', 'DejaVuSansMono-web.woff2'];

function uiCharacters(): Set<string> {
  const found = new Set<string>();
  for (const dir of ['app', 'components']) {
    for (const entry of readdirSync(path.join(root, dir), { recursive: true, withFileTypes: true })) {
      if (!entry.isFile() || !/\.tsx?$/.test(entry.name)) continue;
      for (const char of readFileSync(path.join(entry.parentPath, entry.name), 'utf8')) if (char.codePointAt(0)! > 0x7f) found.add(char);
    }
  }
  return found;
}

describe('web font subsets', () => {
  it('app/fonts.ts serves the WOFF2 subsets, not the TTFs', () => {
    const source = readFileSync(path.join(root, 'app/fonts.ts'), 'utf8');
    expect(source).not.toMatch(/\.ttf'/);
    for (const file of WEB_FONTS) expect(source).toContain(`fonts/web/${file}`);
  });

  for (const file of WEB_FONTS) {
    it(`${file} has a glyph for ° − → ± ✓, ASCII, Latin-1 and every character in the UI source`, () => {
      const font = openSync(path.join(root, 'fonts/web', file));
      expect(font.familyName).toMatch(/DejaVu Sans/);
      const required = ['°', '−', '→', '±', '✓', ...uiCharacters()];
      for (let cp = 0x21; cp <= 0x7e; cp += 1) required.push(String.fromCodePoint(cp));
      const missing = required.filter((char) => !font.hasGlyphForCodePoint(char.codePointAt(0)!) && !/\s|\p{Cf}/u.test(char));
      // DejaVu itself lacks a few pictographs; the UI must not use any the subset cannot show.
      expect(missing).toEqual([]);
    });

    it(`${file} is a fraction of its TTF (under 40 kB)`, () => {
      expect(statSync(path.join(root, 'fonts/web', file)).size).toBeLessThan(40 * 1024);
    });
  }
});
