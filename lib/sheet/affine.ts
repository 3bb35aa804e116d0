import type { Shape } from './drawing';

/** An axis-aligned affine map: x' = scaleX·x + dxMm, y' = scaleY·y + dyMm. Text sizes never change. */
export type AxisMap = { scaleX: number; scaleY: number; dxMm: number; dyMm: number };

export function mapShape(shape: Shape, m: AxisMap): Shape {
  const X = (x: number) => m.scaleX * x + m.dxMm;
  const Y = (y: number) => m.scaleY * y + m.dyMm;
  switch (shape.type) {
    case 'line':
      return { ...shape, x1Mm: X(shape.x1Mm), y1Mm: Y(shape.y1Mm), x2Mm: X(shape.x2Mm), y2Mm: Y(shape.y2Mm) };
    case 'path':
      return { ...shape, pointsMm: shape.pointsMm.map(([x, y]) => [X(x), Y(y)] as [number, number]) };
    case 'ellipse':
      return { ...shape, cxMm: X(shape.cxMm), cyMm: Y(shape.cyMm), rxMm: shape.rxMm * m.scaleX, ryMm: shape.ryMm * m.scaleY };
    case 'rect':
      return { ...shape, xMm: X(shape.xMm), yMm: Y(shape.yMm), widthMm: shape.widthMm * m.scaleX, heightMm: shape.heightMm * m.scaleY };
    case 'text':
      return { ...shape, xMm: X(shape.xMm), yMm: Y(shape.yMm) };
  }
}

export function mapShapes(shapes: readonly Shape[], m: AxisMap): Shape[] {
  return shapes.map((shape) => mapShape(shape, m));
}

export function translateShapes(shapes: readonly Shape[], dxMm: number, dyMm: number): Shape[] {
  return dxMm === 0 && dyMm === 0 ? [...shapes] : mapShapes(shapes, { scaleX: 1, scaleY: 1, dxMm, dyMm });
}
