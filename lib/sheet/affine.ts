import type { Shape } from './drawing';

/** An axis-aligned affine map: x' = scaleX·x + dxMm, y' = scaleY·y + dyMm. Text sizes never change. */
export type AxisMap = { scaleX: number; scaleY: number; dxMm: number; dyMm: number };

export const IDENTITY_MAP: AxisMap = { scaleX: 1, scaleY: 1, dxMm: 0, dyMm: 0 };

/** `m`, then a shift by (dxMm, dyMm). */
export function thenTranslate(m: AxisMap, dxMm: number, dyMm: number): AxisMap {
  return { scaleX: m.scaleX, scaleY: m.scaleY, dxMm: m.dxMm + dxMm, dyMm: m.dyMm + dyMm };
}

// Written out per type (no closures, no spreads): this runs over every shape of every sheet.
export function mapShape(shape: Shape, m: AxisMap): Shape {
  const { scaleX: sx, scaleY: sy, dxMm: dx, dyMm: dy } = m;
  switch (shape.type) {
    case 'line':
      return { type: 'line', x1Mm: sx * shape.x1Mm + dx, y1Mm: sy * shape.y1Mm + dy, x2Mm: sx * shape.x2Mm + dx, y2Mm: sy * shape.y2Mm + dy, strokeMm: shape.strokeMm, data: shape.data, dashMm: shape.dashMm };
    case 'path': {
      const points = shape.pointsMm;
      const mapped = new Array<[number, number]>(points.length);
      for (let i = 0; i < points.length; i += 1) mapped[i] = [sx * points[i]![0] + dx, sy * points[i]![1] + dy];
      return { type: 'path', pointsMm: mapped, closed: shape.closed, fill: shape.fill, strokeMm: shape.strokeMm, data: shape.data };
    }
    case 'ellipse':
      return { type: 'ellipse', cxMm: sx * shape.cxMm + dx, cyMm: sy * shape.cyMm + dy, rxMm: shape.rxMm * sx, ryMm: shape.ryMm * sy, fill: shape.fill, strokeMm: shape.strokeMm, data: shape.data, dashMm: shape.dashMm };
    case 'rect':
      return { type: 'rect', xMm: sx * shape.xMm + dx, yMm: sy * shape.yMm + dy, widthMm: shape.widthMm * sx, heightMm: shape.heightMm * sy, fill: shape.fill, strokeMm: shape.strokeMm, data: shape.data };
    case 'text':
      return {
        type: 'text',
        xMm: sx * shape.xMm + dx,
        yMm: sy * shape.yMm + dy,
        text: shape.text,
        sizeMm: shape.sizeMm,
        anchor: shape.anchor,
        rotateDeg: shape.rotateDeg,
        weight: shape.weight,
        font: shape.font,
        data: shape.data,
      };
  }
}

export function mapShapes(shapes: readonly Shape[], m: AxisMap, into: Shape[] = []): Shape[] {
  for (let i = 0; i < shapes.length; i += 1) into.push(mapShape(shapes[i]!, m));
  return into;
}

export function translateShapes(shapes: readonly Shape[], dxMm: number, dyMm: number): Shape[] {
  return dxMm === 0 && dyMm === 0 ? [...shapes] : mapShapes(shapes, { scaleX: 1, scaleY: 1, dxMm, dyMm });
}
