// Test support: page checks shared by the page tests and the property tests.
import { expect } from 'vitest';
import { shapeBox } from '@/lib/sheet/bounds';
import type { Drawing } from '@/lib/sheet/drawing';

// Every sheet keeps a margin of at least 6 mm (DEVELOPERS.md, "Sheets"; common practice for office printers).
const MIN_MARGIN_MM = 6;

/** Asserts what a printer needs: each page's content inside the page less a ≥ 6 mm margin. */
export function expectPagesPrintable(drawing: Drawing): void {
  for (const page of drawing.pages) {
    const { viewportMm: v, originMm: [ox, oy], sizeMm } = page;
    // The viewport lies within the drawing.
    expect(v.xMm).toBeGreaterThanOrEqual(-1e-6);
    expect(v.yMm).toBeGreaterThanOrEqual(-1e-6);
    expect(v.xMm + v.widthMm).toBeLessThanOrEqual(drawing.sizeMm.widthMm + 1e-6);
    expect(v.yMm + v.heightMm).toBeLessThanOrEqual(drawing.sizeMm.heightMm + 1e-6);
    // Whatever of the drawing lands on the page, plus the page's own shapes, stays inside the margins.
    const inside = (box: ReturnType<typeof shapeBox>) => {
      expect(box.minX).toBeGreaterThanOrEqual(MIN_MARGIN_MM - 1e-6);
      expect(box.minY).toBeGreaterThanOrEqual(MIN_MARGIN_MM - 1e-6);
      expect(box.maxX).toBeLessThanOrEqual(sizeMm.widthMm - MIN_MARGIN_MM + 1e-6);
      expect(box.maxY).toBeLessThanOrEqual(sizeMm.heightMm - MIN_MARGIN_MM + 1e-6);
    };
    const clipped = ox > 0 || oy > 0; // a tile: the viewport itself is clipped, so its rectangle must be inside
    if (clipped) inside({ minX: ox, minY: oy, maxX: ox + v.widthMm, maxY: oy + v.heightMm });
    else
      for (const shape of drawing.shapes) {
        const box = shapeBox(shape);
        if (box.maxX < v.xMm || box.minX > v.xMm + v.widthMm || box.maxY < v.yMm || box.minY > v.yMm + v.heightMm) continue;
        inside({ minX: box.minX - v.xMm + ox, minY: box.minY - v.yMm + oy, maxX: box.maxX - v.xMm + ox, maxY: box.maxY - v.yMm + oy });
      }
    for (const shape of page.pageShapes) inside(shapeBox(shape));
  }
}

