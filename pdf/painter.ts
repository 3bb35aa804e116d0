/**
 * The part of react-pdf's `<Canvas paint>` painter (its pdfkit document, method
 * for method) that the sheet renderer uses. Units are PDF points, y downwards
 * from the page's top-left corner (pdfkit flips the page for us).
 */
export type Painter = {
  save(): Painter;
  restore(): Painter;
  translate(xPt: number, yPt: number): Painter;
  rotate(deg: number, options?: { origin?: [number, number] }): Painter;
  moveTo(xPt: number, yPt: number): Painter;
  lineTo(xPt: number, yPt: number): Painter;
  polygon(...pointsPt: Array<[number, number]>): Painter;
  rect(xPt: number, yPt: number, widthPt: number, heightPt: number): Painter;
  ellipse(cxPt: number, cyPt: number, rxPt: number, ryPt?: number): Painter;
  lineWidth(widthPt: number): Painter;
  lineCap(cap: 'butt' | 'round' | 'square'): Painter;
  lineJoin(join: 'miter' | 'round' | 'bevel'): Painter;
  dash(lengthPt: number, options?: { space?: number; phase?: number }): Painter;
  strokeColor(color: string | number[]): Painter;
  fillColor(color: string | number[]): Painter;
  stroke(): Painter;
  fill(color?: string | number[]): Painter;
  fillAndStroke(fillColor?: string | number[], strokeColor?: string | number[]): Painter;
  clip(rule?: 'nonzero' | 'even-odd'): Painter;
  font(font: unknown, cacheKey: string, sizePt: number): Painter;
  fontSize(sizePt: number): Painter;
  text(text: string, xPt: number, yPt: number, options?: { lineBreak?: boolean; baseline?: 'alphabetic' }): Painter;
};
