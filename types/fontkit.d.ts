// The part of fontkit 2 (an independent font parser, used by the tests to read the shipped web fonts) that we call.
declare module 'fontkit' {
  interface Font {
    familyName: string;
    hasGlyphForCodePoint(codePoint: number): boolean;
  }
  export function openSync(filename: string): Font;
}
