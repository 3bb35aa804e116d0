import { mapShapes } from './affine';
import type { Shape } from './drawing';
import type { PageSpec, PagedDrawing } from './page-layout';
import { correctionFactors, type PrinterScale } from './printer-correction';
import { PRINT_AT_100 } from './sheet-notes';
import { line, text } from './shapes';
import { STROKE_MM, TEXT_MM, textWidthMm } from './sheet-style';
import { fitTitle, wrapText, type FittedTitle } from './text-wrap';

/**
 * The compact band at the top of every page of a multi-page sheet, so a page printed or
 * picked up on its own still says what it is, where it goes and how to print it:
 * title, "page N of M", the print-at-100 % line and a short 100 mm check bar (horizontal).
 * The full check (both axes, 4 in, ID-1 card) stays on the info page.
 */

export const BAND_CHECK_MM = 100;
const ROW_MM = 3.2;
const GAP_MM = 3;
const BAR_LABEL = '100 mm check';
/** The band's title shrinks no smaller than this, mm (about 5 pt). */
const MIN_BAND_TITLE_MM = 1.8;
const TITLE_LINE_GAP = 1.3;
// Holds the words of "· tile A1" together through the wrap (not white space, so never a break).
const GLUE = '\u0001';

/** The heading a tile's band carries: the title, then "· tile A1" kept on one row. */
function headingWords(title: string, tileName: string | undefined): string {
  return tileName ? `${title} ${`· tile ${tileName}`.replace(/ /g, GLUE)}` : title;
}

/**
 * Wrapped to two lines, then shrunk, beside "page N of M" (text-wrap.ts fitTitle). Every page's band
 * is as tall as the tallest: the title is fitted with the longest tile name it may carry.
 */
function bandTitle(title: string, widthMm: number): FittedTitle {
  return fitTitle(headingWords(title, 'MM99'), widthMm - textWidthMm('page 99 of 99', TEXT_MM.body) - GAP_MM, TEXT_MM.body, MIN_BAND_TITLE_MM);
}

/** How much deeper the band is for a title on more than one line. */
function extraTitleMm(fitted: FittedTitle): number {
  return (fitted.rows.length - 1) * fitted.sizeMm * TITLE_LINE_GAP;
}

/** The width the band is laid out in on a page: the printable width, less what a printer correction may widen. */
export function bandWidthMm(page: PageSpec, scale: PrinterScale): number {
  return (page.sizeMm.widthMm - 2 * page.marginMm - 0.5) * Math.min(1, scale.printerScaleX);
}

/** Whether the print line, the bar's label and the bar share one row at this width. */
function barBesidePrintLine(widthMm: number): boolean {
  return textWidthMm(PRINT_AT_100, TEXT_MM.small) + GAP_MM + textWidthMm(BAR_LABEL, TEXT_MM.small) + 1 + BAND_CHECK_MM <= widthMm;
}

/** The band's height for its width (bandWidthMm) and the sheet's title, rule and gap below it included. */
export function pageBandHeightMm(widthMm: number, title: string): number {
  return extraTitleMm(bandTitle(title, widthMm)) + (barBesidePrintLine(widthMm) ? 2 : 3) * ROW_MM + 3;
}

function checkBar(x0: number, y0: number): Shape[] {
  const data = { checkMm: BAND_CHECK_MM, axis: 'x' as const, role: 'page-check-bar' };
  const shapes: Shape[] = [line(x0, y0, x0 + BAND_CHECK_MM, y0, STROKE_MM.outline, data)];
  for (const end of [x0, x0 + BAND_CHECK_MM]) shapes.push(line(end, y0 - 1.2, end, y0 + 1.6, STROKE_MM.outline, { role: 'page-check-end' }));
  for (let mm = 10; mm < BAND_CHECK_MM; mm += 10) shapes.push(line(x0 + mm, y0, x0 + mm, y0 + (mm % 50 === 0 ? 1.4 : 0.9), STROKE_MM.fine, { role: 'page-check-mm' }));
  return shapes;
}

export type PageBandFacts = { title: string; pageNumber: number; pageCount: number; widthMm: number; tileName?: string };

/** The band's shapes, (0, 0) at its top-left corner, `widthMm` wide. */
export function pageBandShapes({ title, pageNumber, pageCount, widthMm, tileName }: PageBandFacts): Shape[] {
  const pageWords = `page ${pageNumber} of ${pageCount}`;
  // Never cut: the size and wrap width fitted for the longest heading, so every page's band is alike.
  const fitted = bandTitle(title, widthMm);
  const rows = wrapText(headingWords(title, tileName), fitted.sizeMm, fitted.wrapWidthMm).map((row) => row.replaceAll(GLUE, ' '));
  const row1 = TEXT_MM.body;
  const row2 = row1 + extraTitleMm(fitted) + ROW_MM;
  const shapes: Shape[] = [
    ...rows.map((row, i) => text(0, row1 + i * fitted.sizeMm * TITLE_LINE_GAP, row, fitted.sizeMm, { weight: 'bold', data: { role: 'page-title' } })),
    text(widthMm, row1, pageWords, TEXT_MM.body, { anchor: 'end', weight: 'bold', data: { role: 'page-number' } }),
    text(0, row2, PRINT_AT_100, TEXT_MM.small, { data: { role: 'page-print-line' } }),
  ];
  const beside = barBesidePrintLine(widthMm);
  const barY = beside ? row2 - 1.2 : row2 + ROW_MM - 1.2;
  const barX = widthMm - BAND_CHECK_MM - 0.5;
  shapes.push(text(barX - 1, barY + 0.7, BAR_LABEL, TEXT_MM.small, { anchor: 'end', data: { role: 'page-check-label' } }));
  shapes.push(...checkBar(barX, barY));
  const ruleY = pageBandHeightMm(widthMm, title) - 1.5;
  shapes.push(line(0, ruleY, widthMm, ruleY, STROKE_MM.fine, { role: 'page-band-rule' }));
  return shapes;
}

/**
 * Puts a band on every page of `paged`, which was laid out on `page` with `bandMm` reserved.
 * Whole-page regions get theirs in the drawing (so the SVG shows it), tiles in their page shapes.
 * Pre-scaled by the printer correction like everything else, so the bar prints 100 mm.
 */
export function addPageBands(paged: PagedDrawing, page: PageSpec, title: string, scale: PrinterScale): PagedDrawing {
  const { x: sx, y: sy } = correctionFactors(scale);
  const widthMm = bandWidthMm(page, scale);
  const pageCount = paged.pages.length;
  paged.pages.forEach((layout, index) => {
    const tileName = paged.tileNames?.[index];
    const band = pageBandShapes({ title, pageNumber: index + 1, pageCount, widthMm, ...(tileName ? { tileName } : {}) });
    const whole = layout.originMm[0] === 0 && layout.originMm[1] === 0;
    const [dx, dy] = whole ? [layout.viewportMm.xMm + page.marginMm, layout.viewportMm.yMm + page.marginMm] : [page.marginMm, page.marginMm];
    mapShapes(band, { scaleX: sx, scaleY: sy, dxMm: dx, dyMm: dy }, whole ? paged.shapes : layout.pageShapes);
  });
  return paged;
}
