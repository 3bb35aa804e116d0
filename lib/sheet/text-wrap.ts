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

/**
 * Greedy word wrap to a width in mm, using the sheet's glyph-width estimate; over-long words are cut.
 * Widths come from character counts (lengthWidthMm), so no candidate line is built just to be measured.
 */
export function wrapText(content: string, sizeMm: number, widthMm: number): string[] {
  const lines: string[] = [];
  for (const paragraph of content.split('\n')) {
    let current = '';
    for (const whole of paragraph.split(/\s+/)) {
      if (!whole) continue;
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

/** The lengths of a text's words, paragraph by paragraph, as wrapText splits them ('\n' between paragraphs, any /\s/ between words). */
export type WordLengths = readonly (readonly number[])[];

/** What /\s/ matches (ECMA-262 WhiteSpace and LineTerminator), by UTF-16 code unit. */
function isSpace(code: number): boolean {
  if (code < 0x80) return code === 32 || (code >= 9 && code <= 13);
  return code === 0xa0 || code === 0x1680 || (code >= 0x2000 && code <= 0x200a) || code === 0x2028 || code === 0x2029 || code === 0x202f || code === 0x205f || code === 0x3000 || code === 0xfeff;
}

/** One pass over the text, nothing split out: what a layout trying width after width needs. */
export function wordLengthsOf(content: string): WordLengths {
  let words: number[] = [];
  const paragraphs: number[][] = [words];
  let length = 0;
  for (let i = 0; i < content.length; i += 1) {
    const code = content.charCodeAt(i);
    if (code === 10 || isSpace(code)) {
      if (length) words.push(length);
      length = 0;
      if (code === 10) paragraphs.push((words = []));
    } else length += 1;
  }
  if (length) words.push(length);
  return paragraphs;
}

/**
 * How many lines wrapText gives, from the words' lengths alone, without building a line.
 * Tested against wrapText.
 */
export function wrappedLineCount(paragraphs: WordLengths, sizeMm: number, widthMm: number): number {
  let count = 0;
  const perPiece = Math.max(1, Math.floor(widthMm / textWidthMm('m', sizeMm)));
  for (const words of paragraphs) {
    let current = 0; // characters on the line so far; 0 for an empty line
    for (const word of words) {
      const long = lengthWidthMm(word, sizeMm) > widthMm;
      for (let left = word; left > 0; ) {
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
