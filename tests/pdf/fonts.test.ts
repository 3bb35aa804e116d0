import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { fontFilePath, loadSheetFonts, missingGlyphs } from '@/pdf/fonts';

// The characters the sheets print beyond ASCII: degree sign, minus sign, arrows, en and em dash, multiplication sign.
const SHEET_SPECIALS = '°−→←–—×·';

describe('sheet fonts', () => {
  it.each(['DejaVuSans.ttf', 'DejaVuSans-Bold.ttf', 'DejaVuSansCondensed.ttf', 'DejaVuSansCondensed-Bold.ttf', 'DejaVuSansMono.ttf'])(
    '%s is a TrueType file, not WOFF/WOFF2 (react-pdf reads TTF only)',
    (file) => {
      const magic = readFileSync(fontFilePath(file)).readUInt32BE(0);
      // OpenType spec, table directory: sfntVersion 0x00010000 for TrueType outlines; WOFF2 starts 'wOF2'.
      expect(magic.toString(16)).toBe('10000');
    },
  );

  it('every loaded face has glyphs for ° − → and the other sheet specials', async () => {
    const fonts = await loadSheetFonts();
    for (const [face, font] of Object.entries(fonts)) {
      expect({ face, missing: missingGlyphs(font, SHEET_SPECIALS + '0123456789 BTDCATDC') }).toEqual({ face, missing: [] });
    }
  });

  it('loads each face once per process (the same objects on a second call)', async () => {
    const first = await loadSheetFonts();
    const second = await loadSheetFonts();
    expect(second['ui-normal']).toBe(first['ui-normal']);
    expect(second['figures-bold']).toBe(first['figures-bold']);
  });

  it('reports a character no face has as missing (the check can fail)', async () => {
    const fonts = await loadSheetFonts();
    // U+10FFFD is a private-use code point no DejaVu face draws.
    expect(missingGlyphs(fonts['ui-normal'], 'A\u{10FFFD}')).toEqual(['\u{10FFFD}']);
  });
});
