import type { Drawing, Shape } from './drawing';

/** Throws a clear error instead of letting NaN or Infinity reach a renderer. */
export function assertFiniteDrawing(drawing: Drawing): Drawing {
  const check = (value: unknown, where: string) => {
    if (typeof value === 'number' && !Number.isFinite(value)) throw new Error(`Sheet layout produced a non-finite number (${value}) at ${where}; this is a bug, please report the request`);
  };
  const checkShape = (shape: Shape, where: string) => {
    for (const [key, value] of Object.entries(shape)) {
      if (key === 'pointsMm') (value as Array<[number, number]>).forEach(([x, y], i) => (check(x, `${where}.pointsMm[${i}]`), check(y, `${where}.pointsMm[${i}]`)));
      else if (key === 'data') for (const [dk, dv] of Object.entries(value as object)) check(dv, `${where}.data.${dk}`);
      else check(value, `${where}.${key}`);
    }
  };
  check(drawing.sizeMm.widthMm, 'sizeMm.widthMm');
  check(drawing.sizeMm.heightMm, 'sizeMm.heightMm');
  drawing.centreMm?.forEach((v, i) => check(v, `centreMm[${i}]`));
  drawing.shapes.forEach((shape, i) => checkShape(shape, `shapes[${i}] (${shape.type})`));
  drawing.pages.forEach((page, p) => {
    for (const [key, value] of Object.entries(page.viewportMm)) check(value, `pages[${p}].viewportMm.${key}`);
    page.originMm.forEach((v, i) => check(v, `pages[${p}].originMm[${i}]`));
    page.pageShapes.forEach((shape, i) => checkShape(shape, `pages[${p}].pageShapes[${i}]`));
  });
  return drawing;
}
