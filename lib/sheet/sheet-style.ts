/** Line weights and text sizes of every sheet, mm. Strokes stay within 0.12–0.3 mm (DEVELOPERS.md, "Sheets"). */
export const STROKE_MM = { fine: 0.12, tick: 0.15, outline: 0.2, heavy: 0.3 } as const;
export const TEXT_MM = { title: 4.2, heading: 3, body: 2.4, small: 2, numeral: 3.2 } as const;
// Average advance width of a glyph as a share of the font size (DejaVu Sans, a safe upper estimate).
export const GLYPH_WIDTH_EM = 0.62;

export function textWidthMm(text: string, sizeMm: number): number {
  return lengthWidthMm(text.length, sizeMm);
}

/** textWidthMm of any text `length` characters long: the estimate counts characters, so wrapping need not build the text. */
export function lengthWidthMm(length: number, sizeMm: number): number {
  return length * sizeMm * GLYPH_WIDTH_EM;
}
