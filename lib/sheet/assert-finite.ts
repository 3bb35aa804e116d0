import type { Drawing, Shape } from './drawing';

function fail(value: number, where: string): never {
  throw new Error(`Sheet layout produced a non-finite number (${value}) at ${where}; this is a bug, please report the request`);
}

// The numbers of each kind of shape, written once: the check walks this table, so a field added to a shape
// is checked by adding its name here.
const NUMBER_KEYS = {
  line: ['x1Mm', 'y1Mm', 'x2Mm', 'y2Mm', 'dashMm', 'strokeMm'],
  path: ['strokeMm'],
  ellipse: ['cxMm', 'cyMm', 'rxMm', 'ryMm', 'dashMm', 'strokeMm'],
  rect: ['xMm', 'yMm', 'widthMm', 'heightMm', 'strokeMm'],
  text: ['xMm', 'yMm', 'sizeMm', 'rotateDeg'],
} as const satisfies { [K in Shape['type']]: ReadonlyArray<keyof Extract<Shape, { type: K }>> };
const DATA_KEYS = ['crankDeg', 'advanceDeg', 'checkMm', 'level'] as const;

function bad(value: number | undefined): value is number {
  return value !== undefined && !Number.isFinite(value);
}

function check(value: number | undefined, where: string, field: string): void {
  if (bad(value)) fail(value, `${where}.${field}`);
}

/** The first non-finite number of a shape (its field name and value), or null; names are made only for a failure. */
function firstNonFinite(shape: Shape): { field: string; value: number } | null {
  const numbers = shape as unknown as Record<string, number | undefined>;
  for (const key of NUMBER_KEYS[shape.type]) if (bad(numbers[key])) return { field: key, value: numbers[key] };
  if (shape.type === 'path') {
    const points = shape.pointsMm;
    for (let i = 0; i < points.length; i += 1) {
      for (const axis of [0, 1] as const) if (bad(points[i]![axis])) return { field: `pointsMm[${i}][${axis}]`, value: points[i]![axis] };
    }
  }
  const data = shape.data;
  if (data) for (const key of DATA_KEYS) if (bad(data[key])) return { field: `data.${key}`, value: data[key] };
  return null;
}

function checkShapes(shapes: readonly Shape[], where: (i: number, shape: Shape) => string): void {
  for (let i = 0; i < shapes.length; i += 1) {
    const shape = shapes[i]!;
    const found = firstNonFinite(shape);
    if (found) fail(found.value, `${where(i, shape)}.${found.field}`);
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
