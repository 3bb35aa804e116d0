import type { TextShape } from '@/lib/sheet/drawing';
import { mmToPt } from '@/lib/units';
import type { SheetFonts } from './fonts';
import type { PointMapping } from './page-mapping';
import type { Painter } from './painter';

const ANCHOR_SHIFT: Record<TextShape['anchor'], number> = { start: 0, middle: -0.5, end: -1 };

/**
 * Real text in an embedded DejaVu subset (extractable, searchable), placed on its
 * alphabetic baseline at the anchor and turned clockwise about it, as in the SVG.
 */
export function paintText(p: Painter, shape: TextShape, at: PointMapping, fonts: SheetFonts): void {
  if (shape.text.length === 0) return;
  const face = `${shape.font}-${shape.weight}` as const;
  const font = fonts[face];
  const sizePt = mmToPt(shape.sizeMm);
  const widthPt = (font.layout(shape.text).advanceWidth / font.unitsPerEm) * sizePt;
  const xPt = at.xPt(shape.xMm);
  const yPt = at.yPt(shape.yMm);
  p.save();
  if (shape.rotateDeg !== 0) p.rotate(shape.rotateDeg, { origin: [xPt, yPt] });
  // The face name is pdfkit's cache key: without it every call would embed-check the font anew.
  p.font(font, `rimscale-${face}`, sizePt).text(shape.text, xPt + ANCHOR_SHIFT[shape.anchor] * widthPt, yPt, {
    lineBreak: false,
    baseline: 'alphabetic',
  });
  p.restore();
}
