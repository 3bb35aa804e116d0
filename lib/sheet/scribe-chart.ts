import { arcLengthMm, chordLengthMm } from '../engine/arc-chord';
import type { Shape } from './drawing';
import type { SheetRequest } from './sheet-request';
import { line, rect, text } from './shapes';
import { STROKE_MM, TEXT_MM } from './sheet-style';
import { wrapText } from './text-wrap';

/**
 * Scribe chart: for marking the flywheel directly with dividers. Per angle θ, the arc along
 * the rim from TDC (π·D·θ/360) and the chord (D·sin(θ/2)), to 0.01 mm, in a ruled table that
 * flows over as many pages as it needs.
 */

export type ScribeRow = { angleDeg: number; arcMm: number; chordMm: number };

export const SCRIBE_ROW_MM = 4.2;
const COLUMNS = [
  { title: 'Angle (° BTDC)', widthMm: 34 },
  { title: 'Arc along the rim (mm)', widthMm: 48 },
  { title: 'Chord, dividers (mm)', widthMm: 48 },
] as const;
const TABLE_WIDTH_MM = COLUMNS.reduce((sum, c) => sum + c.widthMm, 0);
const HEADER_MM = 6;

/** Angles from + i·step (never by repeated addition) up to `toDeg`, with float slack at the end. */
export function scribeAnglesDeg(fromDeg: number, toDeg: number, stepDeg: number): number[] {
  if (!(stepDeg > 0) || !(toDeg >= fromDeg)) return [];
  const count = Math.floor((toDeg - fromDeg) / stepDeg + 1e-9) + 1;
  return Array.from({ length: Math.min(count, 10_000) }, (_, i) => fromDeg + i * stepDeg);
}

export function scribeRows(diameterMm: number, fromDeg: number, toDeg: number, stepDeg: number): ScribeRow[] {
  return scribeAnglesDeg(fromDeg, toDeg, stepDeg).map((angleDeg) => ({
    angleDeg,
    arcMm: arcLengthMm(diameterMm, angleDeg),
    chordMm: chordLengthMm(diameterMm, angleDeg),
  }));
}

function decimalsOf(value: number): number {
  const fraction = String(value).split('.')[1];
  return Math.min(3, fraction ? fraction.length : 0);
}

export function formatAngle(angleDeg: number, decimals: number): string {
  return angleDeg.toFixed(decimals);
}

function captionLines(req: SheetRequest): string[] {
  const direction =
    req.carrier === 'rotating'
      ? 'Mark the flywheel: from its TDC mark, measure in the direction of rotation (marks on the flywheel reach the fixed pointer before TDC).'
      : 'Mark the casing: from its TDC mark, measure against the direction of rotation (read against the flywheel’s mark).';
  return wrapText(`Rim diameter ${req.diameterMm ?? 0} mm. ${direction} Arc = π·D·θ/360, chord = D·sin(θ/2).`, TEXT_MM.small, TABLE_WIDTH_MM);
}

function tableChunk(rows: readonly ScribeRow[], decimals: number, caption: string[]): Shape[] {
  const shapes: Shape[] = [];
  caption.forEach((row, i) => shapes.push(text(0, TEXT_MM.small + i * TEXT_MM.small * 1.38, row, TEXT_MM.small, { data: { role: 'scribe-caption' } })));
  const top = caption.length ? caption.length * TEXT_MM.small * 1.38 + 1.5 : 0;
  const height = HEADER_MM + rows.length * SCRIBE_ROW_MM;
  shapes.push(rect(0, top, TABLE_WIDTH_MM, height, STROKE_MM.outline, 'none', { role: 'scribe-table' }));
  let x = 0;
  COLUMNS.forEach((column, i) => {
    shapes.push(text(x + column.widthMm / 2, top + HEADER_MM - 1.8, column.title, TEXT_MM.small, { anchor: 'middle', weight: 'bold', data: { role: 'scribe-header' } }));
    if (i > 0) shapes.push(line(x, top, x, top + height, STROKE_MM.fine));
    x += column.widthMm;
  });
  shapes.push(line(0, top + HEADER_MM, TABLE_WIDTH_MM, top + HEADER_MM, STROKE_MM.outline));
  rows.forEach((row, i) => {
    const baseline = top + HEADER_MM + (i + 1) * SCRIBE_ROW_MM - 1.2;
    if (i > 0) shapes.push(line(0, top + HEADER_MM + i * SCRIBE_ROW_MM, TABLE_WIDTH_MM, top + HEADER_MM + i * SCRIBE_ROW_MM, STROKE_MM.fine));
    const cells = [formatAngle(row.angleDeg, decimals), row.arcMm.toFixed(2), row.chordMm.toFixed(2)];
    const roles = ['scribe-angle', 'scribe-arc', 'scribe-chord'];
    let right = 0;
    cells.forEach((cell, c) => {
      right += COLUMNS[c]!.widthMm;
      shapes.push(text(right - 4, baseline, cell, TEXT_MM.body, { anchor: 'end', font: 'figures', data: { role: roles[c]!, advanceDeg: row.angleDeg } }));
    });
  });
  return shapes;
}

/**
 * Table chunks, each fitting `pageHeightMm` of height (true mm); the first only `firstHeightMm`
 * (what is left under the info panel), unless that holds fewer than five rows.
 */
export function scribeLayout(req: SheetRequest, firstHeightMm: number, pageHeightMm: number): Shape[][] {
  const rows = scribeRows(req.diameterMm ?? 0, req.fromDeg, req.toDeg, req.stepDeg);
  const decimals = Math.max(decimalsOf(req.fromDeg), decimalsOf(req.stepDeg));
  const caption = captionLines(req);
  const captionMm = caption.length * TEXT_MM.small * 1.38 + 1.5;
  const capacity = (heightMm: number, withCaption: boolean) => Math.floor((heightMm - HEADER_MM - 1 - (withCaption ? captionMm : 0)) / SCRIBE_ROW_MM);
  const chunks: Shape[][] = [];
  let next = 0;
  let firstCapacity = capacity(firstHeightMm, true);
  if (firstCapacity < 5) firstCapacity = capacity(pageHeightMm, true);
  while (next < rows.length || chunks.length === 0) {
    const take = Math.max(1, chunks.length === 0 ? firstCapacity : capacity(pageHeightMm, false));
    chunks.push(tableChunk(rows.slice(next, next + take), decimals, chunks.length === 0 ? caption : []));
    next += take;
  }
  return chunks;
}
