import type { EllipseShape, Fill, LineShape, PathShape, RectShape, ShapeData, TextShape } from './drawing';
import { STROKE_MM } from './sheet-style';

/** Small constructors so layouts read as drawings, not object literals. */

export function line(x1Mm: number, y1Mm: number, x2Mm: number, y2Mm: number, strokeMm: number, data?: ShapeData, dashMm?: number): LineShape {
  const shape: LineShape = { type: 'line', x1Mm, y1Mm, x2Mm, y2Mm, strokeMm };
  if (data) shape.data = data;
  if (dashMm) shape.dashMm = dashMm;
  return shape;
}

export function circle(cxMm: number, cyMm: number, rMm: number, strokeMm: number, data?: ShapeData, dashMm?: number): EllipseShape {
  const shape: EllipseShape = { type: 'ellipse', cxMm, cyMm, rxMm: rMm, ryMm: rMm, fill: 'none', strokeMm };
  if (data) shape.data = data;
  if (dashMm) shape.dashMm = dashMm;
  return shape;
}

export function rect(xMm: number, yMm: number, widthMm: number, heightMm: number, strokeMm: number, fill: Fill = 'none', data?: ShapeData): RectShape {
  const shape: RectShape = { type: 'rect', xMm, yMm, widthMm, heightMm, strokeMm, fill };
  if (data) shape.data = data;
  return shape;
}

export function path(pointsMm: Array<[number, number]>, closed: boolean, fill: Fill, strokeMm: number, data?: ShapeData): PathShape {
  const shape: PathShape = { type: 'path', pointsMm, closed, fill, strokeMm };
  if (data) shape.data = data;
  return shape;
}

export type TextOptions = Partial<Pick<TextShape, 'anchor' | 'rotateDeg' | 'weight' | 'font' | 'data'>>;

export function text(xMm: number, yMm: number, content: string, sizeMm: number, options: TextOptions = {}): TextShape {
  const shape: TextShape = {
    type: 'text',
    xMm,
    yMm,
    text: content,
    sizeMm,
    anchor: options.anchor ?? 'start',
    rotateDeg: options.rotateDeg ?? 0,
    weight: options.weight ?? 'normal',
    font: options.font ?? 'ui',
  };
  if (options.data) shape.data = options.data;
  return shape;
}

/** A straight arrow from (x1, y1) to (x2, y2) with a filled head at the far end. */
export function arrow(x1Mm: number, y1Mm: number, x2Mm: number, y2Mm: number, headMm: number, data?: ShapeData): [LineShape, PathShape] {
  const dx = x2Mm - x1Mm;
  const dy = y2Mm - y1Mm;
  const length = Math.hypot(dx, dy) || 1;
  const ux = dx / length;
  const uy = dy / length;
  const baseX = x2Mm - ux * headMm;
  const baseY = y2Mm - uy * headMm;
  const half = headMm * 0.45;
  return [
    line(x1Mm, y1Mm, baseX, baseY, STROKE_MM.outline, data),
    path(
      [
        [x2Mm, y2Mm],
        [baseX - uy * half, baseY + ux * half],
        [baseX + uy * half, baseY - ux * half],
      ],
      true,
      'black',
      STROKE_MM.fine,
      data,
    ),
  ];
}
