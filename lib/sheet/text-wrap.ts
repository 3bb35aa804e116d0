import { textWidthMm } from './sheet-style';

/** Greedy word wrap to a width in mm, using the sheet's glyph-width estimate. Long words are kept whole. */
export function wrapText(content: string, sizeMm: number, widthMm: number): string[] {
  const lines: string[] = [];
  for (const paragraph of content.split('\n')) {
    let current = '';
    for (const word of paragraph.split(/\s+/).filter(Boolean)) {
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
