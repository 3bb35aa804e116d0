/** Page sizes in millimetres, portrait. ISO 216 (A4, A3) and ANSI/ASME Y14.1 (Letter, Legal, Tabloid). */
export const PAPER_SIZES_MM = {
  A4: { widthMm: 210, heightMm: 297 },
  A3: { widthMm: 297, heightMm: 420 },
  Letter: { widthMm: 215.9, heightMm: 279.4 },
  Legal: { widthMm: 215.9, heightMm: 355.6 },
  Tabloid: { widthMm: 279.4, heightMm: 431.8 },
} as const;

export type PaperName = keyof typeof PAPER_SIZES_MM;
export type Orientation = 'portrait' | 'landscape';
export const PAPER_NAMES = Object.keys(PAPER_SIZES_MM) as PaperName[];

/** Office printers cannot print to the edge; 6 mm is the least we leave. */
export const MIN_MARGIN_MM = 6;
export const DEFAULT_MARGIN_MM = 8;

export function pageSizeMm(paper: PaperName, orientation: Orientation): { widthMm: number; heightMm: number } {
  const { widthMm, heightMm } = PAPER_SIZES_MM[paper];
  return orientation === 'portrait' ? { widthMm, heightMm } : { widthMm: heightMm, heightMm: widthMm };
}
