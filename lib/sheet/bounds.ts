import { cosDeg, sinDeg } from '../angle';
import { IDENTITY_MAP, type AxisMap } from './affine';
import type { Shape } from './drawing';
import { GLYPH_WIDTH_EM, textWidthMm } from './sheet-style';

export type Box = { minX: number; minY: number; maxX: number; maxY: number };

export const EMPTY_BOX: Box = { minX: Infinity, minY: Infinity, maxX: -Infinity, maxY: -Infinity };

function grow(box: Box, x: number, y: number, pad = 0): void {
  box.minX = Math.min(box.minX, x - pad);
  box.minY = Math.min(box.minY, y - pad);
  box.maxX = Math.max(box.maxX, x + pad);
  box.maxY = Math.max(box.maxY, y + pad);
}

/** Corners of the box a text occupies (estimated advance width, ascent ≈ 0.8 em, descent ≈ 0.25 em), rotated. */
export function textCornersMm(shape: Extract<Shape, { type: 'text' }>): Array<[number, number]> {
  const corners: Array<[number, number]> = [];
  forEachTextCornerMm(shape, (x, y) => corners.push([x, y]));
  return corners;
}

/** textCornersMm's corners, in the same order, handed to `visit` one by one (nothing allocated per text). */
export function forEachTextCornerMm(shape: Extract<Shape, { type: 'text' }>, visit: (xMm: number, yMm: number) => void): void {
  const width = textWidthMm(shape.text, shape.sizeMm);
  const start = shape.anchor === 'start' ? 0 : shape.anchor === 'middle' ? -width / 2 : -width;
  const top = -0.8 * shape.sizeMm;
  const bottom = 0.25 * shape.sizeMm;
  const c = cosDeg(shape.rotateDeg);
  const s = sinDeg(shape.rotateDeg);
  const corner = (u: number, v: number) => visit(shape.xMm + u * c - v * s, shape.yMm + u * s + v * c);
  corner(start, top);
  corner(start + width, top);
  corner(start + width, bottom);
  corner(start, bottom);
}

/** The box a shape inks, strokes included, after `map` (positions mapped, text sizes kept). */
export function shapeBox(shape: Shape, box: Box = { ...EMPTY_BOX }, map: AxisMap = IDENTITY_MAP): Box {
  const { scaleX: sx, scaleY: sy, dxMm: dx, dyMm: dy } = map;
  switch (shape.type) {
    case 'line':
      grow(box, sx * shape.x1Mm + dx, sy * shape.y1Mm + dy, shape.strokeMm / 2);
      grow(box, sx * shape.x2Mm + dx, sy * shape.y2Mm + dy, shape.strokeMm / 2);
      break;
    case 'path':
      for (const [x, y] of shape.pointsMm) grow(box, sx * x + dx, sy * y + dy, shape.strokeMm / 2);
      break;
    case 'ellipse':
      grow(box, sx * (shape.cxMm - shape.rxMm) + dx, sy * (shape.cyMm - shape.ryMm) + dy, shape.strokeMm / 2);
      grow(box, sx * (shape.cxMm + shape.rxMm) + dx, sy * (shape.cyMm + shape.ryMm) + dy, shape.strokeMm / 2);
      break;
    case 'rect':
      grow(box, sx * shape.xMm + dx, sy * shape.yMm + dy, shape.strokeMm / 2);
      grow(box, sx * (shape.xMm + shape.widthMm) + dx, sy * (shape.yMm + shape.heightMm) + dy, shape.strokeMm / 2);
      break;
    case 'text': {
      const ox = sx * shape.xMm + dx - shape.xMm;
      const oy = sy * shape.yMm + dy - shape.yMm;
      for (const [x, y] of textCornersMm(shape)) grow(box, x + ox, y + oy);
      break;
    }
  }
  return box;
}

export function shapesBox(shapes: readonly Shape[], map: AxisMap = IDENTITY_MAP): Box {
  const box = { ...EMPTY_BOX };
  for (const shape of shapes) shapeBox(shape, box, map);
  return box.minX <= box.maxX ? box : { minX: 0, minY: 0, maxX: 0, maxY: 0 };
}

type RectMm = { xMm: number; yMm: number; widthMm: number; heightMm: number };

// The widest glyph is about 1 em, the text box's estimate 0.62 em a glyph: grow text boxes by the difference
// and one em more, so culling can only keep too much, never drop a mark that would show.
function textSlackMm(shape: Shape): number {
  return shape.type === 'text' ? shape.sizeMm * (shape.text.length * (1 - GLYPH_WIDTH_EM) + 1) : 0;
}

/** Whether any ink of `shape` may fall inside `rect` (a tile's viewport): a page skips the shapes for which this is false. */
export function shapeMayShowIn(shape: Shape, rect: RectMm): boolean {
  const box = shapeBox(shape);
  const slackMm = textSlackMm(shape);
  return (
    box.maxX + slackMm >= rect.xMm &&
    box.minX - slackMm <= rect.xMm + rect.widthMm &&
    box.maxY + slackMm >= rect.yMm &&
    box.minY - slackMm <= rect.yMm + rect.heightMm
  );
}
