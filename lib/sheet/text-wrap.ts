import { lengthWidthMm, textWidthMm } from './sheet-style';

/** Cuts a word wider than the line into pieces that fit. */
function splitLongWord(word: string, sizeMm: number, widthMm: number): string[] {
  const perLine = Math.max(1, Math.floor(widthMm / textWidthMm('m', sizeMm)));
  const pieces: string[] = [];
  for (let i = 0; i < word.length; i += perLine) pieces.push(word.slice(i, i + perLine));
  return pieces;
}

export type FittedTitle = { rows: string[]; sizeMm: number; wrapWidthMm: number };

/**
 * A title wrapped to at most `maxRows` lines, then shrunk in 10 % steps (never below `minSizeMm`)
 * until it does; never cut. Capitals in bold run wider than the average glyph the wrap estimates
 * (about 0.75 em in DejaVu Sans Bold, from memory), so the wrap width is narrowed by the title's share of them.
 */
export function fitTitle(title: string, widthMm: number, sizeMm: number, minSizeMm: number, maxRows = 2): FittedTitle {
  const letters = title.replace(/\s/g, '');
  const capitals = letters.length ? letters.replace(/[^A-Z0-9]/g, '').length / letters.length : 0;
  const wrapWidthMm = widthMm / (1 + capitals * (0.75 / 0.62 - 1));
  let size = sizeMm;
  while (size > minSizeMm && wrapText(title, size, wrapWidthMm).length > maxRows) size = Math.max(minSizeMm, size * 0.9);
  return { rows: wrapText(title, size, wrapWidthMm), sizeMm: size, wrapWidthMm };
}

/** The words of each paragraph of a text, split once so a caller can try many widths. */
export type Paragraphs = readonly (readonly string[])[];

export function paragraphsOf(content: string): Paragraphs {
  return content.split('\n').map((paragraph) => paragraph.split(/\s+/).filter(Boolean));
}

/**
 * Greedy word wrap to a width in mm, using the sheet's glyph-width estimate; over-long words are cut.
 * Widths come from character counts (lengthWidthMm), so no candidate line is built just to be measured.
 */
export function wrapText(content: string, sizeMm: number, widthMm: number): string[] {
  return wrapParagraphs(paragraphsOf(content), sizeMm, widthMm);
}

export function wrapParagraphs(paragraphs: Paragraphs, sizeMm: number, widthMm: number): string[] {
  const lines: string[] = [];
  for (const words of paragraphs) {
    let current = '';
    for (const whole of words) {
      const pieces = lengthWidthMm(whole.length, sizeMm) > widthMm ? splitLongWord(whole, sizeMm, widthMm) : [whole];
      for (const word of pieces) {
        if (current && lengthWidthMm(current.length + 1 + word.length, sizeMm) > widthMm) {
          lines.push(current);
          current = word;
        } else current = current ? `${current} ${word}` : word;
      }
    }
    lines.push(current);
  }
  return lines;
}

/**
 * How many lines wrapParagraphs gives, from the words' lengths alone: what a layout trying
 * width after width needs, without building a line. Tested against wrapParagraphs.
 */
export function wrappedLineCount(paragraphs: Paragraphs, sizeMm: number, widthMm: number): number {
  let count = 0;
  const perPiece = Math.max(1, Math.floor(widthMm / textWidthMm('m', sizeMm)));
  for (const words of paragraphs) {
    let current = 0; // characters on the line so far; 0 for an empty line
    for (const word of words) {
      const long = lengthWidthMm(word.length, sizeMm) > widthMm;
      for (let left = word.length; left > 0; ) {
        const piece = long ? Math.min(perPiece, left) : left;
        left -= piece;
        if (current && lengthWidthMm(current + 1 + piece, sizeMm) > widthMm) {
          count += 1;
          current = piece;
        } else current = current ? current + 1 + piece : piece;
      }
    }
    count += 1;
  }
  return count;
}
