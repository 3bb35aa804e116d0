import { getDocument, OPS, type PDFDocumentProxy } from 'pdfjs-dist/legacy/build/pdf.mjs';
import * as pdfjsWorker from 'pdfjs-dist/legacy/build/pdf.worker.mjs';
import { withWorkerGlobal } from './pdfjs-worker-global';

/**
 * Reads the stroked and filled line segments of a PDF with pdfjs-dist's operator
 * list (an independent PDF reader), tracking the current transformation matrix
 * through save (q), restore (Q) and transform (cm) as ISO 32000-1 §8.4.4 defines
 * them, and returns them in page millimetres from the top-left corner.
 * 1 pt = 1/72 in (ISO 32000-1 §8.3.2.3) and 1 in = 25.4 mm (international inch).
 */
export const MM_PER_PT = 25.4 / 72;

export type Segment = { x1Mm: number; y1Mm: number; x2Mm: number; y2Mm: number };
/** Curve end points (circles and ellipses are drawn as four Bézier arcs meeting on their axes). */
export type PageGeometry = { widthPt: number; heightPt: number; segments: Segment[]; curveEndsMm: Array<[number, number]> };

type Matrix = [number, number, number, number, number, number];

// pdfjs path buffer codes (DrawOPS in pdfjs-dist's build).
const DRAW_MOVE_TO = 0;
const DRAW_LINE_TO = 1;
const DRAW_CURVE_TO = 2;
const DRAW_QUADRATIC_CURVE_TO = 3;
const DRAW_CLOSE_PATH = 4;

/** pdfjs passes a text matrix either as six numbers or as one typed array of six. */
function matrixArg(args: unknown[]): Matrix {
  const first = args[0];
  return (typeof first === 'number' ? args : Array.from(first as ArrayLike<number>)) as Matrix;
}

/** m × ctm: the `cm` operator pre-multiplies the current matrix (ISO 32000-1 §8.4.4). */
function multiply(m: Matrix, ctm: Matrix): Matrix {
  const [a, b, c, d, e, f] = m;
  const [A, B, C, D, E, F] = ctm;
  return [a * A + b * C, a * B + b * D, c * A + d * C, c * B + d * D, e * A + f * C + E, e * B + f * D + F];
}

function apply([a, b, c, d, e, f]: Matrix, x: number, y: number): [number, number] {
  return [a * x + c * y + e, b * x + d * y + f];
}

function segmentsOfPath(path: ArrayLike<number>, ctm: Matrix, heightPt: number, curveEndsMm: Array<[number, number]>): Segment[] {
  const toMm = (x: number, y: number): [number, number] => {
    const [px, py] = apply(ctm, x, y);
    return [px * MM_PER_PT, (heightPt - py) * MM_PER_PT];
  };
  const segments: Segment[] = [];
  let current: [number, number] | undefined;
  let start: [number, number] | undefined;
  for (let i = 0; i < path.length; ) {
    const op = path[i]!;
    if (op === DRAW_MOVE_TO) {
      current = start = toMm(path[i + 1]!, path[i + 2]!);
      i += 3;
    } else if (op === DRAW_LINE_TO) {
      const next = toMm(path[i + 1]!, path[i + 2]!);
      if (current) segments.push({ x1Mm: current[0], y1Mm: current[1], x2Mm: next[0], y2Mm: next[1] });
      current = next;
      i += 3;
    } else if (op === DRAW_CURVE_TO) {
      current = toMm(path[i + 5]!, path[i + 6]!);
      curveEndsMm.push(current);
      i += 7;
    } else if (op === DRAW_QUADRATIC_CURVE_TO) {
      current = toMm(path[i + 3]!, path[i + 4]!);
      i += 5;
    } else if (op === DRAW_CLOSE_PATH) {
      if (current && start) segments.push({ x1Mm: current[0], y1Mm: current[1], x2Mm: start[0], y2Mm: start[1] });
      current = start;
      i += 1;
    } else {
      throw new Error(`unknown path op ${op}`);
    }
  }
  return segments;
}

const PAINTING_OPS: ReadonlySet<number> = new Set([
  OPS.stroke,
  OPS.closeStroke,
  OPS.fill,
  OPS.eoFill,
  OPS.fillStroke,
  OPS.eoFillStroke,
  OPS.closeFillStroke,
  OPS.closeEOFillStroke,
]);

/** Opens a PDF with pdfjs-dist and its own worker code (see pdfjs-worker-global.ts). */
export function openPdf(data: Uint8Array): Promise<PDFDocumentProxy> {
  return withWorkerGlobal(pdfjsWorker, () => getDocument({ data: new Uint8Array(data), verbosity: 0 }).promise);
}

export async function readPdfGeometry(data: Uint8Array): Promise<PageGeometry[]> {
  const doc = await openPdf(data);
  try {
    const pages: PageGeometry[] = [];
    for (let n = 1; n <= doc.numPages; n += 1) {
      const page = await doc.getPage(n);
      const [, , widthPt, heightPt] = page.view as [number, number, number, number];
      const list = await page.getOperatorList();
      const segments: Segment[] = [];
      const curveEndsMm: Array<[number, number]> = [];
      let ctm: Matrix = [1, 0, 0, 1, 0, 0];
      const stack: Matrix[] = [];
      list.fnArray.forEach((fn, index) => {
        const args = list.argsArray[index] as unknown[];
        if (fn === OPS.save) stack.push(ctm);
        else if (fn === OPS.restore) ctm = stack.pop() ?? [1, 0, 0, 1, 0, 0];
        else if (fn === OPS.transform) ctm = multiply(args as Matrix, ctm);
        else if (fn === OPS.constructPath) {
          const [paintOp, [path]] = args as [number, [ArrayLike<number> | null]];
          if (path && PAINTING_OPS.has(paintOp)) segments.push(...segmentsOfPath(path, ctm, heightPt, curveEndsMm));
        }
      });
      pages.push({ widthPt, heightPt, segments, curveEndsMm });
    }
    return pages;
  } finally {
    await doc.destroy();
  }
}

export function segmentLengthMm(s: Segment): number {
  return Math.hypot(s.x2Mm - s.x1Mm, s.y2Mm - s.y1Mm);
}

/** The segment whose end points are nearest (either way round) to the two given points. */
export function nearestSegment(segments: Segment[], x1Mm: number, y1Mm: number, x2Mm: number, y2Mm: number) {
  let best: { segment: Segment; distanceMm: number } | undefined;
  for (const segment of segments) {
    const same = Math.max(Math.hypot(segment.x1Mm - x1Mm, segment.y1Mm - y1Mm), Math.hypot(segment.x2Mm - x2Mm, segment.y2Mm - y2Mm));
    const swapped = Math.max(Math.hypot(segment.x2Mm - x1Mm, segment.y2Mm - y1Mm), Math.hypot(segment.x1Mm - x2Mm, segment.y1Mm - y2Mm));
    const distanceMm = Math.min(same, swapped);
    if (!best || distanceMm < best.distanceMm) best = { segment, distanceMm };
  }
  return best;
}

/**
 * A text run: baseline origin in page millimetres from the top-left, advance width
 * along the baseline (mm), the baseline's direction, clockwise degrees with y down, and its font size (mm).
 */
export type TextItem = { text: string; xMm: number; yMm: number; widthMm: number; angleDeg: number; page: number; sizeMm: number };

type Glyph = { unicode: string; width: number } | number | null;

/**
 * Each show-text operation as the operator list has it, one run per TJ/Tj (pdfjs's
 * text-content API merges neighbouring runs). The run starts at the text matrix's
 * origin under the CTM (ISO 32000-1 §9.4.2); its advance is the sum of the glyph
 * widths from the embedded font's /W array, × font size / 1000, less TJ adjustments.
 */
export async function readPdfTextItems(data: Uint8Array): Promise<TextItem[]> {
  const doc = await openPdf(data);
  try {
    const items: TextItem[] = [];
    for (let n = 1; n <= doc.numPages; n += 1) {
      const page = await doc.getPage(n);
      const heightPt = (page.view as number[])[3]!;
      const list = await page.getOperatorList();
      let ctm: Matrix = [1, 0, 0, 1, 0, 0];
      const stack: Matrix[] = [];
      let textMatrix: Matrix = [1, 0, 0, 1, 0, 0];
      let fontSize = 0;
      list.fnArray.forEach((fn, index) => {
        const args = list.argsArray[index] as unknown[];
        if (fn === OPS.save) stack.push(ctm);
        else if (fn === OPS.restore) ctm = stack.pop() ?? [1, 0, 0, 1, 0, 0];
        else if (fn === OPS.transform) ctm = multiply(args as Matrix, ctm);
        else if (fn === OPS.beginText) textMatrix = [1, 0, 0, 1, 0, 0];
        else if (fn === OPS.setTextMatrix) textMatrix = matrixArg(args);
        else if (fn === OPS.moveText) textMatrix = multiply([1, 0, 0, 1, args[0] as number, args[1] as number], textMatrix);
        else if (fn === OPS.setFont) fontSize = args[1] as number;
        else if (fn === OPS.showText) {
          const glyphs = args[0] as Glyph[];
          let text = '';
          let advance = 0; // text space units
          for (const glyph of glyphs) {
            if (typeof glyph === 'number') advance -= (glyph * fontSize) / 1000;
            else if (glyph) {
              text += glyph.unicode;
              advance += (glyph.width * fontSize) / 1000;
            }
          }
          const m = multiply(textMatrix, ctm);
          const [x, y] = apply(m, 0, 0);
          const [xEnd, yEnd] = apply(m, advance, 0);
          items.push({
            text,
            xMm: x * MM_PER_PT,
            yMm: (heightPt - y) * MM_PER_PT,
            widthMm: Math.hypot(xEnd - x, yEnd - y) * MM_PER_PT,
            angleDeg: (Math.atan2(-(yEnd - y), xEnd - x) * 180) / Math.PI, // PDF y is up; the page's y is down
            page: n,
            // The font size on the page: the text space's unit y vector under the text matrix and CTM (ISO 32000-1 §9.4.4), × the Tf size.
            sizeMm: Math.hypot(m[2], m[3]) * Math.abs(fontSize) * MM_PER_PT,
          });
        }
      });
    }
    return items;
  } finally {
    await doc.destroy();
  }
}
