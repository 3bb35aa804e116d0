import type { Drawing, LineShape, PageLayout, Shape } from '@/lib/sheet/drawing';
import { pageSizeMm, type Orientation, type PaperName } from '@/lib/sheet/paper';

/**
 * Hand-made drawings for the PDF renderer tests, independent of the layout code:
 * a small wheel (ticks every 10° at radius 40 mm about (80, 90)), the scale check
 * bars, an 18° BTDC label, the print line, a grey and a hatched band.
 */
export const FIXTURE_CENTRE_MM: [number, number] = [80, 90];

function tick(crankDeg: number, scaleX = 1, scaleY = 1): LineShape {
  const rad = (crankDeg * Math.PI) / 180;
  const [cx, cy] = FIXTURE_CENTRE_MM;
  const at = (r: number): [number, number] => [cx + r * Math.sin(rad) * scaleX, cy - r * Math.cos(rad) * scaleY];
  const [x1, y1] = at(40);
  const [x2, y2] = at(34);
  return { type: 'line', x1Mm: x1, y1Mm: y1, x2Mm: x2, y2Mm: y2, strokeMm: 0.2, data: { crankDeg, level: 10 } };
}

function checkBars(x0: number, y0: number, scaleX: number, scaleY: number): Shape[] {
  const inchMm = 101.6; // 4 in × 25.4 mm, the international inch of 1959
  return [
    { type: 'line', x1Mm: x0, y1Mm: y0, x2Mm: x0 + 100 * scaleX, y2Mm: y0, strokeMm: 0.25, data: { checkMm: 100, axis: 'x' } },
    { type: 'line', x1Mm: x0, y1Mm: y0 + 6, x2Mm: x0 + inchMm * scaleX, y2Mm: y0 + 6, strokeMm: 0.25, data: { checkMm: inchMm, axis: 'x' } },
    { type: 'line', x1Mm: x0 - 8, y1Mm: y0 + 12, x2Mm: x0 - 8, y2Mm: y0 + 12 + 100 * scaleY, strokeMm: 0.25, data: { checkMm: 100, axis: 'y' } },
    { type: 'line', x1Mm: x0 - 14, y1Mm: y0 + 12, x2Mm: x0 - 14, y2Mm: y0 + 12 + inchMm * scaleY, strokeMm: 0.25, data: { checkMm: inchMm, axis: 'y' } },
    { type: 'rect', xMm: x0 + 10, yMm: y0 + 14, widthMm: 85.6 * scaleX, heightMm: 53.98 * scaleY, fill: 'none', strokeMm: 0.2, data: { checkMm: 85.6, role: 'card' } },
  ];
}

export function fixtureShapes(scaleX = 1, scaleY = 1): Shape[] {
  const ticks = Array.from({ length: 36 }, (_, i) => tick(i * 10, scaleX, scaleY));
  return [
    { type: 'ellipse', cxMm: 80, cyMm: 90, rxMm: 40 * scaleX, ryMm: 40 * scaleY, fill: 'none', strokeMm: 0.2, data: { role: 'cut-line' } },
    ...ticks,
    { type: 'text', xMm: 80, yMm: 40, text: '18° BTDC', sizeMm: 3, anchor: 'middle', rotateDeg: -18, weight: 'bold', font: 'figures', data: { advanceDeg: 18 } },
    { type: 'text', xMm: 20, yMm: 20, text: 'Fixture wheel 80 mm', sizeMm: 5, anchor: 'start', rotateDeg: 0, weight: 'bold', font: 'ui' },
    { type: 'text', xMm: 20, yMm: 28, text: 'Print at 100 % / actual size — turn off fit-to-page', sizeMm: 3, anchor: 'start', rotateDeg: 0, weight: 'normal', font: 'ui' },
    { type: 'path', pointsMm: [[130, 40], [160, 40], [160, 50], [130, 50]], closed: true, fill: 'grey15', strokeMm: 0.15 },
    { type: 'path', pointsMm: [[130, 55], [160, 55], [160, 65], [130, 65]], closed: true, fill: 'hatch', strokeMm: 0.15 },
    ...checkBars(40, 160, scaleX, scaleY),
  ];
}

export function singlePage(paper: PaperName, orientation: Orientation): PageLayout {
  const sizeMm = pageSizeMm(paper, orientation);
  return { sizeMm, viewportMm: { xMm: 0, yMm: 0, ...sizeMm }, originMm: [0, 0], pageShapes: [] };
}

export function fixtureDrawing(options: { paper?: PaperName; orientation?: Orientation; scaleX?: number; scaleY?: number } = {}): Drawing {
  const { paper = 'A4', orientation = 'portrait', scaleX = 1, scaleY = 1 } = options;
  const page = singlePage(paper, orientation);
  return {
    sizeMm: page.sizeMm,
    centreMm: FIXTURE_CENTRE_MM,
    shapes: fixtureShapes(scaleX, scaleY),
    pages: [page],
    warnings: [],
    title: 'Fixture wheel 80 mm',
  };
}
