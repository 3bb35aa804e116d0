import { translateShapes } from './affine';
import { checkBlockShapes } from './check-block';
import type { Shape } from './drawing';
import { polarPointMm } from './polar';
import { wheelAngleDeg } from './scale-direction';
import type { SheetRequest } from './sheet-request';
import { CAUTIONS, PRINT_AT_100, whichWayNote } from './sheet-notes';
import { arrow, circle, line, path, rect, text } from './shapes';
import { STROKE_MM, TEXT_MM } from './sheet-style';
import { fitTitle, wrapText } from './text-wrap';
import { howToRows, howToShapes } from './how-to';

/** Title block, print line, "which way" note with its small diagram, cautions and the scale check. */

/** `notes`: what the layout could not draw as asked, and why (printed on the sheet as well as returned). */
export type InfoContent = { title: string; lines: string[]; request: SheetRequest; notes: string[]; howTo: string[] };

const LINE_GAP = 1.3; // line height as a share of the text size
const GUTTER_MM = 4;
const MIN_TEXT_COLUMN_MM = 58;

function paragraph(shapes: Shape[], content: string, x: number, y: number, sizeMm: number, widthMm: number, weight: 'normal' | 'bold' = 'normal', role?: string): number {
  const rows = wrapText(content, sizeMm, widthMm);
  rows.forEach((row, i) => shapes.push(text(x, y + sizeMm + i * sizeMm * LINE_GAP, row, sizeMm, { weight, ...(role ? { data: { role } } : {}) })));
  return y + sizeMm + (rows.length - 1) * sizeMm * LINE_GAP + sizeMm * 0.6;
}

const MIN_TITLE_MM = 2.4;

/** The title wraps to at most two lines, then shrinks (never below MIN_TITLE_MM) until it does (text-wrap.ts). */
function titleParagraph(shapes: Shape[], title: string, widthMm: number): number {
  const fitted = fitTitle(title, widthMm, TEXT_MM.title, MIN_TITLE_MM);
  return paragraph(shapes, title, 0, 0, fitted.sizeMm, fitted.wrapWidthMm, 'bold', 'title');
}

function whichWayDiagram(req: SheetRequest, x: number, y: number): { shapes: Shape[]; heightMm: number } {
  const shapes: Shape[] = [];
  if (req.kind === 'strip') {
    const ahead = req.carrier === 'rotating' ? 'BTDC' : 'ATDC';
    const behind = ahead === 'BTDC' ? 'ATDC' : 'BTDC';
    shapes.push(rect(x, y + 3, 56, 6, STROKE_MM.fine));
    shapes.push(line(x + 28, y + 3, x + 28, y + 9, STROKE_MM.heavy, { role: 'which-way' }));
    shapes.push(text(x + 28, y + 2, 'TDC', TEXT_MM.small, { anchor: 'middle' }));
    shapes.push(text(x + 14, y + 7.3, behind, TEXT_MM.small, { anchor: 'middle', weight: 'bold', data: { role: `which-way-${behind.toLowerCase()}` } }));
    shapes.push(text(x + 42, y + 7.3, ahead, TEXT_MM.small, { anchor: 'middle', weight: 'bold', data: { role: `which-way-${ahead.toLowerCase()}` } }));
    shapes.push(...arrow(x, y + 12, x + 56, y + 12, 2.2, { role: 'which-way-arrow' }));
    shapes.push(text(x + 28, y + 15.6, 'the rim moves this way', TEXT_MM.small, { anchor: 'middle' }));
    return { shapes, heightMm: 17 };
  }
  const centre: [number, number] = [x + 12, y + 11];
  const r = 8;
  const sense = { rotation: req.rotation, carrier: req.carrier };
  shapes.push(circle(centre[0], centre[1], r, STROKE_MM.fine));
  shapes.push(line(centre[0], centre[1] - r, centre[0], centre[1] - r + 3, STROKE_MM.heavy, { role: 'which-way' }));
  shapes.push(text(centre[0], centre[1] - r - 0.8, 'TDC', TEXT_MM.small, { anchor: 'middle' }));
  const arc: Array<[number, number]> = [];
  const [a0, a1] = req.rotation === 'cw' ? [150, 230] : [210, 130];
  for (let i = 0; i <= 16; i += 1) arc.push(polarPointMm(centre, r - 2.5, a0 + ((a1 - a0) * i) / 16));
  shapes.push(path(arc, false, 'none', STROKE_MM.outline, { role: 'which-way-arrow' }));
  const tip = polarPointMm(centre, r - 2.5, a1 + (req.rotation === 'cw' ? 12 : -12));
  shapes.push(arrow(arc[15]![0], arc[15]![1], tip[0], tip[1], 1.8, { role: 'which-way-arrow' })[1]);
  for (const [crankDeg, label] of [
    [315, 'BTDC'],
    [45, 'ATDC'],
  ] as const) {
    const angle = wheelAngleDeg(crankDeg, sense);
    const [px, py] = polarPointMm(centre, r + 2, angle);
    shapes.push(text(px, py + 1, label, TEXT_MM.small, { anchor: angle < 180 ? 'start' : 'end', weight: 'bold', data: { role: `which-way-${label.toLowerCase()}` } }));
  }
  return { shapes, heightMm: 21 };
}

function textColumn(content: InfoContent, widthMm: number): { shapes: Shape[]; heightMm: number } {
  const shapes: Shape[] = [];
  let y = titleParagraph(shapes, content.title, widthMm);
  const boxTop = y;
  y += 0.6;
  for (const row of content.lines) y = paragraph(shapes, row, 1.5, y, TEXT_MM.small, widthMm - 3);
  shapes.push(rect(0, boxTop - 0.4, widthMm, y - boxTop + 1, STROKE_MM.fine, 'none', { role: 'title-block' }));
  y += 1.8;
  if (content.notes.length) {
    y = paragraph(shapes, `Layout notes: ${content.notes.join(' · ')}`, 0, y, TEXT_MM.small, widthMm, 'normal', 'layout-notes');
    y += 1;
  }
  y = paragraph(shapes, PRINT_AT_100, 0, y, TEXT_MM.body, widthMm, 'bold', 'print-at-100');
  y += 0.5;
  if (content.howTo.length) {
    shapes.push(...howToShapes(content.howTo, widthMm, 0, y));
    y += howToRows(content.howTo, widthMm).heightMm + 1.5;
  }
  if (content.request.kind === 'check') {
    // Nothing turns on a check sheet: no which-way note.
  } else if (content.request.kind === 'strip') {
    y = paragraph(shapes, whichWayNote(content.request), 0, y, TEXT_MM.small, widthMm, 'normal', 'which-way-note');
    const diagram = whichWayDiagram(content.request, 4, y);
    shapes.push(...diagram.shapes);
    y += diagram.heightMm;
  } else {
    // The round diagram (about 34 mm wide with its labels) stands left of the note, which wraps beside it.
    const diagram = whichWayDiagram(content.request, 6, y);
    shapes.push(...diagram.shapes);
    const noteEnd = paragraph(shapes, whichWayNote(content.request), 37, y, TEXT_MM.small, widthMm - 37, 'normal', 'which-way-note');
    y = Math.max(noteEnd, y + diagram.heightMm);
  }
  y = paragraph(shapes, CAUTIONS, 0, y, TEXT_MM.small, widthMm, 'normal', 'cautions');
  return { shapes, heightMm: y };
}

/** The info panel's shapes at a given width: text beside the scale check when there is room, above it otherwise. */
export function infoPanel(content: InfoContent, widthMm: number): Shape[] {
  const check = checkBlockShapes();
  const besideWidth = widthMm - check.widthMm - GUTTER_MM;
  if (besideWidth >= MIN_TEXT_COLUMN_MM) return [...check.shapes, ...translateShapes(textColumn(content, besideWidth).shapes, check.widthMm + GUTTER_MM, 0)];
  const column = textColumn(content, Math.max(widthMm, check.widthMm));
  return [...column.shapes, ...translateShapes(check.shapes, 0, column.heightMm + GUTTER_MM)];
}
