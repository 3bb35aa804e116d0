import { lengthWidthMm, textWidthMm } from './sheet-style';

/** Cuts a word wider than the line into pieces that fit. */
function splitLongWord(word: string, sizeMm: number, widthMm: number): string[] {
  const perLine = Math.max(1, Math.floor(widthMm / textWidthMm('m', sizeMm)));
  const pieces: string[] = [];
  for (let i = 0; i < word.length; i += perLine) pieces.push(word.slice(i, i + perLine));
  return pieces;
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
