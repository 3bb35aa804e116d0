import { mapShapes } from './affine';
import type { Shape } from './drawing';
import type { PageSpec, PagedDrawing } from './page-layout';
import { correctionFactors, type PrinterScale } from './printer-correction';
import { PRINT_AT_100 } from './sheet-notes';
import { line, text } from './shapes';
import { STROKE_MM, TEXT_MM, textWidthMm } from './sheet-style';

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

/** Whether the print line, the bar's label and the bar share one row at this width. */
function barBesidePrintLine(widthMm: number): boolean {
  return textWidthMm(PRINT_AT_100, TEXT_MM.small) + GAP_MM + textWidthMm(BAR_LABEL, TEXT_MM.small) + 1 + BAND_CHECK_MM <= widthMm;
}

/** The band's height for a printable width, rule and gap below it included. */
export function pageBandHeightMm(widthMm: number): number {
  return (barBesidePrintLine(widthMm) ? 2 : 3) * ROW_MM + 3;
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
  const heading = tileName ? `${title} · tile ${tileName}` : title;
  const roomMm = widthMm - textWidthMm(pageWords, TEXT_MM.body) - GAP_MM;
  const perChar = textWidthMm('m', TEXT_MM.body);
  const fitted = textWidthMm(heading, TEXT_MM.body) <= roomMm ? heading : `${heading.slice(0, Math.max(1, Math.floor(roomMm / perChar) - 1))}…`;
  const row1 = TEXT_MM.body;
  const row2 = row1 + ROW_MM;
  const shapes: Shape[] = [
    text(0, row1, fitted, TEXT_MM.body, { weight: 'bold', data: { role: 'page-title' } }),
    text(widthMm, row1, pageWords, TEXT_MM.body, { anchor: 'end', weight: 'bold', data: { role: 'page-number' } }),
    text(0, row2, PRINT_AT_100, TEXT_MM.small, { data: { role: 'page-print-line' } }),
  ];
  const beside = barBesidePrintLine(widthMm);
  const barY = beside ? row2 - 1.2 : row2 + ROW_MM - 1.2;
  const barX = widthMm - BAND_CHECK_MM - 0.5;
  shapes.push(text(barX - 1, barY + 0.7, BAR_LABEL, TEXT_MM.small, { anchor: 'end', data: { role: 'page-check-label' } }));
  shapes.push(...checkBar(barX, barY));
  const ruleY = pageBandHeightMm(widthMm) - 1.5;
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
  const widthMm = (page.sizeMm.widthMm - 2 * page.marginMm - 0.5) * Math.min(1, scale.printerScaleX);
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
