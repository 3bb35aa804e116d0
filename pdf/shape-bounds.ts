import type { PageLayout, Shape } from '@/lib/sheet/drawing';

type BoxMm = { minXMm: number; minYMm: number; maxXMm: number; maxYMm: number };

/**
 * A box sure to hold the shape (text generously: any rotation, wide glyphs), so a
 * tiled page can skip what its viewport cannot show without ever losing a mark.
 */
function outerBoxMm(shape: Shape): BoxMm {
  switch (shape.type) {
    case 'line':
      return box([shape.x1Mm, shape.x2Mm], [shape.y1Mm, shape.y2Mm], shape.strokeMm);
    case 'path':
      return box(shape.pointsMm.map((p) => p[0]), shape.pointsMm.map((p) => p[1]), shape.strokeMm);
    case 'ellipse':
      return box([shape.cxMm - shape.rxMm, shape.cxMm + shape.rxMm], [shape.cyMm - shape.ryMm, shape.cyMm + shape.ryMm], shape.strokeMm);
    case 'rect':
      return box([shape.xMm, shape.xMm + shape.widthMm], [shape.yMm, shape.yMm + shape.heightMm], shape.strokeMm);
    case 'text': {
      const reachMm = shape.sizeMm * (shape.text.length + 1);
      return box([shape.xMm - reachMm, shape.xMm + reachMm], [shape.yMm - reachMm, shape.yMm + reachMm], 0);
    }
  }
}

function box(xs: number[], ys: number[], padMm: number): BoxMm {
  return { minXMm: Math.min(...xs) - padMm, minYMm: Math.min(...ys) - padMm, maxXMm: Math.max(...xs) + padMm, maxYMm: Math.max(...ys) + padMm };
}

export function shapeMayShowOn(shape: Shape, page: PageLayout): boolean {
  const b = outerBoxMm(shape);
  const v = page.viewportMm;
  return b.maxXMm >= v.xMm && b.minXMm <= v.xMm + v.widthMm && b.maxYMm >= v.yMm && b.minYMm <= v.yMm + v.heightMm;
}
