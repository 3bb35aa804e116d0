/**
 * pdfkit shapes text through the font object it is given, word by word, and keeps the
 * shaped words only for the document at hand, so every sheet shaped its numerals and
 * labels anew: ~20 % of a PDF worker's time and a third of what it allocated per sheet.
 * A shaped word depends only on the font file, so this keeps them per font for the life
 * of the worker.
 *
 * pdfkit scales the positions of a run it gets in place (to its 1000-unit em), so each
 * call hands out fresh position objects; the glyphs are fontkit's own shared objects.
 */

import { boundedMemo } from '@/lib/bounded-memo';

export type GlyphPosition = { xAdvance: number; yAdvance: number; xOffset: number; yOffset: number };

/** The part of a fontkit font this wraps: its `layout`, in the form pdfkit calls it. */
export type ShapingFont = {
  layout(text: string, features?: unknown, ...rest: unknown[]): { glyphs: unknown[]; positions: GlyphPosition[] };
};

/** Words kept per font: a sheet shows a few hundred; the rest are names users type (the oldest go first). */
export const MAX_MEMO_WORDS = 5000;

/** A shaped run as fontkit's GlyphRun presents it to pdfkit: the advance follows the positions. */
class ShapedRun {
  constructor(
    readonly glyphs: unknown[],
    readonly positions: GlyphPosition[],
  ) {}

  get advanceWidth(): number {
    let width = 0;
    for (const position of this.positions) width += position.xAdvance;
    return width;
  }
}

function copyPositions(positions: readonly GlyphPosition[]): GlyphPosition[] {
  return positions.map(({ xAdvance, yAdvance, xOffset, yOffset }) => ({ xAdvance, yAdvance, xOffset, yOffset }));
}

/**
 * The same font, whose plain `layout(text)` (no features, script or direction) is
 * remembered. Everything else (glyphs, subsets, tables) is the font's own, reached
 * through the prototype, so pdfkit embeds and subsets it as before.
 */
export function withShapingMemo<Font extends ShapingFont>(font: Font): Font {
  const shaped = boundedMemo<{ glyphs: unknown[]; positions: GlyphPosition[] }>(MAX_MEMO_WORDS);
  const memoized = Object.create(font) as Font;
  memoized.layout = (text: string, ...options: unknown[]) => {
    if (options.some((option) => option !== undefined)) return font.layout(text, ...(options as [unknown]));
    const run = shaped(text, () => {
      const fresh = font.layout(text);
      return { glyphs: fresh.glyphs, positions: copyPositions(fresh.positions) };
    });
    return new ShapedRun(run.glyphs.slice(), copyPositions(run.positions));
  };
  return memoized;
}
