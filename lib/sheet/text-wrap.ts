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
