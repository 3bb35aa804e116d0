import type { EllipseShape, LineShape, PathShape, RectShape, Shape } from '@/lib/sheet/drawing';
import { mmToPt } from '@/lib/units';
import type { SheetFonts } from './fonts';
import type { PointMapping } from './page-mapping';
import { boxOfPoints, paintOutline } from './paint-fill';
import { paintText } from './paint-text';
import type { Painter } from './painter';

/** Draws one drawing shape through the painter; `at` maps its millimetres to page points. */
export function paintShape(p: Painter, shape: Shape, at: PointMapping, fonts: SheetFonts): void {
  switch (shape.type) {
    case 'line':
      return paintLine(p, shape, at);
    case 'path':
      return paintPath(p, shape, at);
    case 'ellipse':
      return paintEllipse(p, shape, at);
    case 'rect':
      return paintRect(p, shape, at);
    case 'text':
      return paintText(p, shape, at, fonts);
  }
}

function withDash(p: Painter, dashMm: number | undefined, draw: () => void): void {
  if (!(dashMm && dashMm > 0)) return draw();
  p.save();
  p.dash(mmToPt(dashMm), { space: mmToPt(dashMm) });
  draw();
  p.restore();
}

function paintLine(p: Painter, line: LineShape, at: PointMapping): void {
  if (!(line.strokeMm > 0)) return;
  withDash(p, line.dashMm, () => {
    p.moveTo(at.xPt(line.x1Mm), at.yPt(line.y1Mm))
      .lineTo(at.xPt(line.x2Mm), at.yPt(line.y2Mm))
      .lineWidth(mmToPt(line.strokeMm))
      .stroke();
  });
}

function paintPath(p: Painter, path: PathShape, at: PointMapping): void {
  if (path.pointsMm.length < 2) return;
  const pointsPt = path.pointsMm.map(([xMm, yMm]) => [at.xPt(xMm), at.yPt(yMm)] as [number, number]);
  const trace = () => {
    if (path.closed) {
      p.polygon(...pointsPt);
      return;
    }
    const [first, ...rest] = pointsPt;
    p.moveTo(first![0], first![1]);
    for (const [x, y] of rest) p.lineTo(x, y);
  };
  // An open path is only ever stroked: a fill needs a closed outline.
  paintOutline(p, trace, path.closed ? path.fill : 'none', mmToPt(path.strokeMm), boxOfPoints(pointsPt));
}

function paintEllipse(p: Painter, ellipse: EllipseShape, at: PointMapping): void {
  const cxPt = at.xPt(ellipse.cxMm);
  const cyPt = at.yPt(ellipse.cyMm);
  const rxPt = mmToPt(ellipse.rxMm);
  const ryPt = mmToPt(ellipse.ryMm);
  if (!(rxPt > 0 && ryPt > 0)) return;
  const box = { minXPt: cxPt - rxPt, minYPt: cyPt - ryPt, maxXPt: cxPt + rxPt, maxYPt: cyPt + ryPt };
  withDash(p, ellipse.dashMm, () =>
    paintOutline(p, () => p.ellipse(cxPt, cyPt, rxPt, ryPt), ellipse.fill, mmToPt(ellipse.strokeMm), box),
  );
}

function paintRect(p: Painter, rect: RectShape, at: PointMapping): void {
  const xPt = at.xPt(rect.xMm);
  const yPt = at.yPt(rect.yMm);
  const widthPt = mmToPt(rect.widthMm);
  const heightPt = mmToPt(rect.heightMm);
  const box = { minXPt: xPt, minYPt: yPt, maxXPt: xPt + widthPt, maxYPt: yPt + heightPt };
  paintOutline(p, () => p.rect(xPt, yPt, widthPt, heightPt), rect.fill, mmToPt(rect.strokeMm), box);
}
