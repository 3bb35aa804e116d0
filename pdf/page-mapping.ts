import type { PageLayout } from '@/lib/sheet/drawing';
import { mmToPt, PT_PER_MM } from '@/lib/units';

/** Maps millimetres (drawing or page) to page points, y downwards from the page's top-left. */
export type PointMapping = {
  xPt(xMm: number): number;
  yPt(yMm: number): number;
};

/** Page shapes are already in page millimetres. */
export const pageMmToPt: PointMapping = { xPt: mmToPt, yPt: mmToPt };

/**
 * Drawing millimetres on `page`: the viewport's corner lands on `originMm`, then
 * 1 mm = 72/25.4 pt (ISO 32000-1 §8.3.2.3 user space unit). No other scaling:
 * the printer correction is already in the drawing.
 */
export function drawingToPagePt(page: PageLayout): PointMapping {
  const dxMm = page.originMm[0] - page.viewportMm.xMm;
  const dyMm = page.originMm[1] - page.viewportMm.yMm;
  return {
    xPt: (xMm) => (xMm + dxMm) * PT_PER_MM,
    yPt: (yMm) => (yMm + dyMm) * PT_PER_MM,
  };
}

/** Where the viewport sits on the page, in points: the clip rectangle of the drawing. */
export function viewportRectPt(page: PageLayout): { xPt: number; yPt: number; widthPt: number; heightPt: number } {
  return {
    xPt: mmToPt(page.originMm[0]),
    yPt: mmToPt(page.originMm[1]),
    widthPt: mmToPt(page.viewportMm.widthMm),
    heightPt: mmToPt(page.viewportMm.heightMm),
  };
}
