// The part of fontkit 2 (an independent font parser, used by the tests to read the shipped fonts) that we call.
declare module 'fontkit' {
  interface Glyph {
    /** The glyph's ink box in font units (y up from the baseline). */
    bbox: { minX: number; minY: number; maxX: number; maxY: number };
  }
  interface Font {
    familyName: string;
    unitsPerEm: number;
    ascent: number;
    descent: number;
    hasGlyphForCodePoint(codePoint: number): boolean;
    glyphForCodePoint(codePoint: number): Glyph;
  }
  export function openSync(filename: string): Font;
}
