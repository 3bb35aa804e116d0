import type { Drawing, Shape } from './drawing';

function fail(value: number, where: string): never {
  throw new Error(`Sheet layout produced a non-finite number (${value}) at ${where}; this is a bug, please report the request`);
}

function check(value: number | undefined, where: string, field: string): void {
  if (value !== undefined && !Number.isFinite(value)) fail(value, `${where}.${field}`);
}

/** A finite number, or one left out (optional fields). */
function ok(value: number | undefined): boolean {
  return value === undefined || Number.isFinite(value);
}

// Checked without naming the shape: its location text is made only for the one that fails.
function shapeIsFinite(shape: Shape): boolean {
  let fine: boolean;
  switch (shape.type) {
    case 'line':
      fine = ok(shape.x1Mm) && ok(shape.y1Mm) && ok(shape.x2Mm) && ok(shape.y2Mm) && ok(shape.dashMm);
      break;
    case 'path': {
      fine = true;
      const points = shape.pointsMm;
      for (let i = 0; i < points.length && fine; i += 1) fine = ok(points[i]![0]) && ok(points[i]![1]);
      break;
    }
    case 'ellipse':
      fine = ok(shape.cxMm) && ok(shape.cyMm) && ok(shape.rxMm) && ok(shape.ryMm) && ok(shape.dashMm);
      break;
    case 'rect':
      fine = ok(shape.xMm) && ok(shape.yMm) && ok(shape.widthMm) && ok(shape.heightMm);
      break;
    case 'text':
      fine = ok(shape.xMm) && ok(shape.yMm) && ok(shape.sizeMm) && ok(shape.rotateDeg);
      break;
  }
  if (shape.type !== 'text') fine &&= ok(shape.strokeMm);
  const data = shape.data;
  return data ? fine && ok(data.crankDeg) && ok(data.advanceDeg) && ok(data.checkMm) && ok(data.level) : fine;
}

/** Throws naming the shape's first non-finite field. */
function checkShape(shape: Shape, where: string): void {
  switch (shape.type) {
    case 'line':
      check(shape.x1Mm, where, 'x1Mm');
      check(shape.y1Mm, where, 'y1Mm');
      check(shape.x2Mm, where, 'x2Mm');
      check(shape.y2Mm, where, 'y2Mm');
      check(shape.dashMm, where, 'dashMm');
      break;
    case 'path':
      shape.pointsMm.forEach(([x, y], i) => {
        check(x, where, `pointsMm[${i}][0]`);
        check(y, where, `pointsMm[${i}][1]`);
      });
      break;
    case 'ellipse':
      check(shape.cxMm, where, 'cxMm');
      check(shape.cyMm, where, 'cyMm');
      check(shape.rxMm, where, 'rxMm');
      check(shape.ryMm, where, 'ryMm');
      check(shape.dashMm, where, 'dashMm');
      break;
    case 'rect':
      check(shape.xMm, where, 'xMm');
      check(shape.yMm, where, 'yMm');
      check(shape.widthMm, where, 'widthMm');
      check(shape.heightMm, where, 'heightMm');
      break;
    case 'text':
      check(shape.xMm, where, 'xMm');
      check(shape.yMm, where, 'yMm');
      check(shape.sizeMm, where, 'sizeMm');
      check(shape.rotateDeg, where, 'rotateDeg');
      break;
  }
  if (shape.type !== 'text') check(shape.strokeMm, where, 'strokeMm');
  const data = shape.data;
  if (data) {
    check(data.crankDeg, where, 'data.crankDeg');
    check(data.advanceDeg, where, 'data.advanceDeg');
    check(data.checkMm, where, 'data.checkMm');
    check(data.level, where, 'data.level');
  }
}

function checkShapes(shapes: readonly Shape[], where: (i: number, shape: Shape) => string): void {
  for (let i = 0; i < shapes.length; i += 1) {
    const shape = shapes[i]!;
    if (!shapeIsFinite(shape)) checkShape(shape, where(i, shape));
  }
}

/** Throws a clear error instead of letting NaN or Infinity reach a renderer. */
export function assertFiniteDrawing(drawing: Drawing): Drawing {
  check(drawing.sizeMm.widthMm, 'drawing', 'sizeMm.widthMm');
  check(drawing.sizeMm.heightMm, 'drawing', 'sizeMm.heightMm');
  drawing.centreMm?.forEach((v, i) => check(v, 'drawing', `centreMm[${i}]`));
  checkShapes(drawing.shapes, (i, shape) => `shapes[${i}] (${shape.type})`);
  drawing.pages.forEach((page, p) => {
    const v = page.viewportMm;
    check(v.xMm, `pages[${p}]`, 'viewportMm.xMm');
    check(v.yMm, `pages[${p}]`, 'viewportMm.yMm');
    check(v.widthMm, `pages[${p}]`, 'viewportMm.widthMm');
    check(v.heightMm, `pages[${p}]`, 'viewportMm.heightMm');
    page.originMm.forEach((o, i) => check(o, `pages[${p}]`, `originMm[${i}]`));
    checkShapes(page.pageShapes, (i, shape) => `pages[${p}].pageShapes[${i}] (${shape.type})`);
  });
  return drawing;
}
