import { textWidthMm } from './sheet-style';

/** Cuts a word wider than the line into pieces that fit. */
function splitLongWord(word: string, sizeMm: number, widthMm: number): string[] {
  const perLine = Math.max(1, Math.floor(widthMm / textWidthMm('m', sizeMm)));
  const pieces: string[] = [];
  for (let i = 0; i < word.length; i += perLine) pieces.push(word.slice(i, i + perLine));
  return pieces;
}

/** Greedy word wrap to a width in mm, using the sheet's glyph-width estimate; over-long words are cut. */
export function wrapText(content: string, sizeMm: number, widthMm: number): string[] {
  const lines: string[] = [];
  for (const paragraph of content.split('\n')) {
    let current = '';
    const words = paragraph.split(/\s+/).filter(Boolean).flatMap((word) => (textWidthMm(word, sizeMm) > widthMm ? splitLongWord(word, sizeMm, widthMm) : [word]));
    for (const word of words) {
      const candidate = current ? `${current} ${word}` : word;
      if (current && textWidthMm(candidate, sizeMm) > widthMm) {
        lines.push(current);
        current = word;
      } else current = candidate;
    }
    lines.push(current);
  }
  return lines;
}
