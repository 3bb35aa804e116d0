import { shapeMayShowIn } from '@/lib/sheet/bounds';
import type { Drawing, PageLayout } from '@/lib/sheet/drawing';
import type { SheetFonts } from './fonts';
import { drawingToPagePt, pageMmToPt, viewportRectPt } from './page-mapping';
import { paintShape } from './paint-shape';
import type { Painter } from './painter';

/**
 * One printed page: the page's viewport of the drawing, moved to its origin and
 * clipped to it (so tiles overlap only where the layout says), then the page's own
 * shapes (segment letters, join marks, registration crosses) in page millimetres.
 */
export function paintPage(p: Painter, drawing: Drawing, page: PageLayout, fonts: SheetFonts): void {
  p.strokeColor('#000000').fillColor('#000000').lineCap('butt').lineJoin('miter');
  const clip = viewportRectPt(page);
  const at = drawingToPagePt(page);
  p.save();
  p.rect(clip.xPt, clip.yPt, clip.widthPt, clip.heightPt).clip();
  for (const shape of drawing.shapes) {
    if (shapeMayShowIn(shape, page.viewportMm)) paintShape(p, shape, at, fonts);
  }
  p.restore();
  for (const shape of page.pageShapes) paintShape(p, shape, pageMmToPt, fonts);
}
