import { cosDeg, sinDeg } from '../angle';
import type { Shape } from './drawing';
import { textWidthMm } from './sheet-style';

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
  const width = textWidthMm(shape.text, shape.sizeMm);
  const start = shape.anchor === 'start' ? 0 : shape.anchor === 'middle' ? -width / 2 : -width;
  const top = -0.8 * shape.sizeMm;
  const bottom = 0.25 * shape.sizeMm;
  const c = cosDeg(shape.rotateDeg);
  const s = sinDeg(shape.rotateDeg);
  return [
    [start, top],
    [start + width, top],
    [start + width, bottom],
    [start, bottom],
  ].map(([u, v]) => [shape.xMm + u! * c - v! * s, shape.yMm + u! * s + v! * c] as [number, number]);
}

/** The box a shape inks, strokes included. */
export function shapeBox(shape: Shape, box: Box = { ...EMPTY_BOX }): Box {
  switch (shape.type) {
    case 'line':
      grow(box, shape.x1Mm, shape.y1Mm, shape.strokeMm / 2);
      grow(box, shape.x2Mm, shape.y2Mm, shape.strokeMm / 2);
      break;
    case 'path':
      for (const [x, y] of shape.pointsMm) grow(box, x, y, shape.strokeMm / 2);
      break;
    case 'ellipse':
      grow(box, shape.cxMm - shape.rxMm, shape.cyMm - shape.ryMm, shape.strokeMm / 2);
      grow(box, shape.cxMm + shape.rxMm, shape.cyMm + shape.ryMm, shape.strokeMm / 2);
      break;
    case 'rect':
      grow(box, shape.xMm, shape.yMm, shape.strokeMm / 2);
      grow(box, shape.xMm + shape.widthMm, shape.yMm + shape.heightMm, shape.strokeMm / 2);
      break;
    case 'text':
      for (const [x, y] of textCornersMm(shape)) grow(box, x, y);
      break;
  }
  return box;
}

export function shapesBox(shapes: readonly Shape[]): Box {
  const box = { ...EMPTY_BOX };
  for (const shape of shapes) shapeBox(shape, box);
  return box.minX <= box.maxX ? box : { minX: 0, minY: 0, maxX: 0, maxY: 0 };
}
