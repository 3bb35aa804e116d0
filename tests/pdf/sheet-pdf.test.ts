import { describe, expect, it } from 'vitest';
import { buildDrawing } from '@/lib/sheet/build-drawing';
import type { Drawing } from '@/lib/sheet/drawing';
import { renderSvg } from '@/lib/sheet/render-svg';
import { sheetRequestSchema, type SheetRequestInput } from '@/lib/sheet/sheet-request';
import { renderSheetPdf } from '@/pdf/render-sheet-pdf';
import { nearestSegment, readPdfGeometry, readPdfTextItems, segmentLengthMm, type Segment } from './read-pdf-geometry';
import { readPdfText } from './read-pdf-text';
import { svgLines, svgTexts, type SvgLine } from './svg-lines';

/**
 * Real sheets (buildDrawing → renderSheetPdf), checked against independent readers:
 * pdf-parse for text and page sizes, pdfjs-dist's operator list for geometry, and
 * the SVG of the same drawing parsed with @xmldom/xmldom for where the ticks belong.
 */

const DATE = new Date('2026-03-01T00:00:00Z');

function sheet(input: SheetRequestInput) {
  const drawing = buildDrawing(sheetRequestSchema.parse(input), { date: DATE });
  return { drawing, svg: renderSvg(drawing) };
}

/** PDF segments of every page mapped back to drawing millimetres (page − origin + viewport corner). */
async function pdfSegmentsInDrawingMm(drawing: Drawing, pdf: Uint8Array): Promise<Segment[]> {
  const pages = await readPdfGeometry(pdf);
  expect(pages).toHaveLength(drawing.pages.length);
  return pages.flatMap((page, index) => {
    const layout = drawing.pages[index]!;
    const dx = layout.viewportMm.xMm - layout.originMm[0];
    const dy = layout.viewportMm.yMm - layout.originMm[1];
    return page.segments.map((s) => ({ x1Mm: s.x1Mm + dx, y1Mm: s.y1Mm + dy, x2Mm: s.x2Mm + dx, y2Mm: s.y2Mm + dy }));
  });
}

/** The PDF length of a check bar: the PDF segment along its axis that starts where the bar starts (± 0.05 mm). */
function pdfLengthOf(line: SvgLine, segments: Segment[]): number {
  const startsThere = (s: Segment) =>
    Math.hypot(s.x1Mm - line.x1, s.y1Mm - line.y1) < 0.05 || Math.hypot(s.x2Mm - line.x1, s.y2Mm - line.y1) < 0.05;
  const alongAxis = (s: Segment) => (line.data.axis === 'x' ? Math.abs(s.y1Mm - s.y2Mm) < 1e-3 : Math.abs(s.x1Mm - s.x2Mm) < 1e-3);
  const candidates = segments.filter((s) => startsThere(s) && alongAxis(s));
  expect(candidates.length, 'a PDF segment where the bar starts').toBeGreaterThan(0);
  return Math.max(...candidates.map(segmentLengthMm));
}

function checkBar(lines: SvgLine[], checkMm: string, axis: 'x' | 'y'): SvgLine {
  const bar = lines.find((l) => l.data['check-mm'] === checkMm && l.data.axis === axis && l.data.role === 'check-bar');
  expect(bar, `check bar ${checkMm} ${axis}`).toBeDefined();
  return bar!;
}

describe('a 100 mm degree wheel as PDF', () => {
  const input: SheetRequestInput = { kind: 'wheel', diameterMm: 100, advanceMarksDeg: [18], title: 'Shop wheel 100' };

  it('carries the title, the advance label, BTDC and the print line as text (pdf-parse)', async () => {
    const { drawing } = sheet(input);
    const { text, info, pageCount } = await readPdfText(await renderSheetPdf(drawing));
    expect(pageCount).toBe(1);
    expect(text).toContain('Shop wheel 100');
    expect(text).toContain('18° BTDC');
    expect(text).toMatch(/\bBTDC\b/);
    expect(text).toContain('Print at 100 %');
    expect(info.Title).toBe(drawing.title);
    expect(info.Author).toBe('Rimscale');
    expect(typeof info.Subject).toBe('string');
  });

  it('draws the 100 mm and 4 in check bars at 100 and 101.6 mm, horizontal and vertical (pdfjs, ± 0.01 mm)', async () => {
    const { drawing, svg } = sheet(input);
    const segments = await pdfSegmentsInDrawingMm(drawing, await renderSheetPdf(drawing));
    const lines = svgLines(svg);
    // 4 in = 101.6 mm exactly (international inch, 1959); 1 pt = 1/72 in (ISO 32000-1 §8.3.2.3).
    expect(pdfLengthOf(checkBar(lines, '100', 'x'), segments)).toBeCloseTo(100, 2);
    expect(pdfLengthOf(checkBar(lines, '100', 'y'), segments)).toBeCloseTo(100, 2);
    expect(pdfLengthOf(checkBar(lines, '101.6', 'x'), segments)).toBeCloseTo(101.6, 2);
    expect(pdfLengthOf(checkBar(lines, '101.6', 'y'), segments)).toBeCloseTo(101.6, 2);
  });

  it('puts both ends of every graduation where the SVG has them, within 0.01 mm', async () => {
    const { drawing, svg } = sheet(input);
    const segments = await pdfSegmentsInDrawingMm(drawing, await renderSheetPdf(drawing));
    const ticks = svgLines(svg).filter((l) => l.data['crank-deg'] !== undefined);
    expect(ticks.length).toBeGreaterThanOrEqual(360); // 1° graduations at 100 mm (0.87 mm pitch ≥ 0.6 mm)
    const worst = Math.max(...ticks.map((t) => nearestSegment(segments, t.x1, t.y1, t.x2, t.y2)!.distanceMm));
    expect(worst).toBeLessThan(0.01);
  });
});

describe('a 100 mm degree wheel as PDF: outline and labels', () => {
  const input: SheetRequestInput = { kind: 'wheel', diameterMm: 100, hubHoleMm: 20, advanceMarksDeg: [18] };

  it('draws the cut circle 100 mm across and the hub hole 20 mm, about the SVG centre (Bézier arc ends, ± 0.01 mm)', async () => {
    const { drawing, svg } = sheet(input);
    const [page] = await readPdfGeometry(await renderSheetPdf(drawing));
    const [cx, cy] = /data-centre-mm="([\d.]+) ([\d.]+)"/.exec(svg)!.slice(1).map(Number) as [number, number];
    for (const radiusMm of [50, 10]) {
      // A circle is four arcs meeting at its top, bottom, left and right points.
      for (const [x, y] of [[cx + radiusMm, cy], [cx - radiusMm, cy], [cx, cy + radiusMm], [cx, cy - radiusMm]] as const) {
        const nearest = Math.min(...page!.curveEndsMm.map(([px, py]) => Math.hypot(px - x, py - y)));
        expect(nearest, `arc end at (${x}, ${y})`).toBeLessThan(0.01);
      }
    }
  });

  it('sets every label on the SVG anchor point and angle (pdfjs text runs, widths from the embedded font)', async () => {
    const { drawing, svg } = sheet(input);
    const items = await readPdfTextItems(await renderSheetPdf(drawing));
    const texts = svgTexts(svg).filter((t) => t.text.trim() !== '');
    expect(texts.length).toBeGreaterThan(40);
    const share: Record<string, number> = { start: 0, middle: 0.5, end: 1 };
    for (const t of texts) {
      const matches = items.filter((item) => item.text.trim() === t.text.trim());
      expect(matches.length, `a PDF run for "${t.text}"`).toBeGreaterThan(0);
      // The SVG anchor lies `share` of the run's width along the baseline from its origin.
      const distanceMm = Math.min(
        ...matches.map((item) => {
          const rad = (item.angleDeg * Math.PI) / 180;
          const along = share[t.anchor]! * item.widthMm;
          return Math.hypot(item.xMm + along * Math.cos(rad) - t.x, item.yMm + along * Math.sin(rad) - t.y);
        }),
      );
      expect(distanceMm, `"${t.text}" at (${t.x}, ${t.y})`).toBeLessThan(0.01);
      const angleOff = Math.min(...matches.map((item) => Math.abs(((item.angleDeg - t.rotateDeg + 540) % 360) - 180)));
      expect(angleOff, `"${t.text}" turned ${t.rotateDeg}°`).toBeLessThan(0.01);
    }
  });
});

describe('printer correction in the PDF', () => {
  it('with printerScaleX 0.98 draws a 100 mm wheel as an ellipse 102.04 mm wide and 100 mm high', async () => {
    const { drawing, svg } = sheet({ kind: 'wheel', diameterMm: 100, printerScaleX: 0.98 });
    const [page] = await readPdfGeometry(await renderSheetPdf(drawing));
    const [cx, cy] = /data-centre-mm="([\d.]+) ([\d.]+)"/.exec(svg)!.slice(1).map(Number) as [number, number];
    const rx = 50 / 0.98; // 51.0204 mm
    for (const [x, y] of [[cx + rx, cy], [cx - rx, cy], [cx, cy + 50], [cx, cy - 50]] as const) {
      expect(Math.min(...page!.curveEndsMm.map(([px, py]) => Math.hypot(px - x, py - y)))).toBeLessThan(0.01);
    }
  });


  it('with printerScaleX 0.98 draws the horizontal 100 mm bar 102.04 mm and the vertical one 100 mm', async () => {
    const { drawing, svg } = sheet({ kind: 'check', printerScaleX: 0.98 });
    const segments = await pdfSegmentsInDrawingMm(drawing, await renderSheetPdf(drawing));
    const lines = svgLines(svg);
    // A printer that makes 1 mm into 0.98 mm needs 100 / 0.98 = 102.0408 mm drawn to print 100 mm.
    expect(pdfLengthOf(checkBar(lines, '100', 'x'), segments)).toBeCloseTo(102.04, 2);
    expect(pdfLengthOf(checkBar(lines, '100', 'y'), segments)).toBeCloseTo(100, 2);
  });
});

describe('page sizes', () => {
  // ISO 216: A4 210 × 297 mm, A3 297 × 420 mm. ANSI/ASME Y14.1: Letter 8.5 × 11 in, Legal 8.5 × 14 in,
  // Tabloid 11 × 17 in. ISO 32000-1 §8.3.2.3: 1 pt = 1/72 in, so 1 mm = 72/25.4 pt.
  it.each([
    ['A4', 'portrait', 595.28, 841.89],
    ['A4', 'landscape', 841.89, 595.28],
    ['A3', 'portrait', 841.89, 1190.55],
    ['Letter', 'portrait', 612, 792],
    ['Letter', 'landscape', 792, 612],
    ['Legal', 'portrait', 612, 1008],
    ['Tabloid', 'landscape', 1224, 792],
  ] as const)('%s %s is %s × %s pt on every page', async (paper, orientation, widthPt, heightPt) => {
    const { drawing } = sheet({ kind: 'wheel', diameterMm: 80, paper, orientation });
    const { pages } = await readPdfText(await renderSheetPdf(drawing));
    expect(pages.length).toBeGreaterThanOrEqual(1);
    for (const page of pages) {
      expect(page.widthPt).toBeCloseTo(widthPt, 1);
      expect(page.heightPt).toBeCloseTo(heightPt, 1);
    }
  });
});

describe('tiled sheets', () => {
  it.each([
    ['a 400 mm wheel on A4', { kind: 'wheel', diameterMm: 400 }],
    ['a 300 mm rim strip, 40 mm wide, on A4', { kind: 'strip', diameterMm: 300, stripWidthMm: 40 }],
    // (a 300 mm strip now fits one A4 portrait page, so the landscape case is a longer strip)
    ['a 600 mm rim strip on A4 landscape', { kind: 'strip', diameterMm: 600, orientation: 'landscape' }],
  ] as Array<[string, SheetRequestInput]>)('%s takes several pages, each of the chosen size, none blank', async (_, input) => {
    const { drawing } = sheet(input);
    const pdf = await renderSheetPdf(drawing);
    const pages = await readPdfGeometry(pdf);
    expect(pages.length).toBeGreaterThan(1);
    expect(pages).toHaveLength(drawing.pages.length);
    const landscape = input.orientation === 'landscape';
    for (const page of pages) {
      expect(page.widthPt).toBeCloseTo(landscape ? 841.89 : 595.28, 1); // ISO 216 A4 in points
      expect(page.heightPt).toBeCloseTo(landscape ? 595.28 : 841.89, 1);
      expect(page.segments.length).toBeGreaterThan(0);
    }
  });

  it('a tiled 400 mm wheel still has every graduation of the SVG somewhere, within 0.01 mm', async () => {
    const { drawing, svg } = sheet({ kind: 'wheel', diameterMm: 400 });
    const segments = await pdfSegmentsInDrawingMm(drawing, await renderSheetPdf(drawing));
    const ticks = svgLines(svg).filter((l) => l.data['crank-deg'] !== undefined);
    expect(ticks.length).toBeGreaterThanOrEqual(720); // 0.5° graduations: 1.75 mm pitch at 400 mm
    const worst = Math.max(...ticks.map((t) => nearestSegment(segments, t.x1, t.y1, t.x2, t.y2)!.distanceMm));
    expect(worst).toBeLessThan(0.01);
  });
});

describe('every sheet kind renders', () => {
  it.each([
    ['wheel', { kind: 'wheel', diameterMm: 180, hubHoleMm: 30, numbering: 'full', portEvents: [{ name: 'Exhaust', opensCrankDeg: 95, closesCrankDeg: 265 }] }],
    ['ring', { kind: 'ring', innerDiameterMm: 120, outerDiameterMm: 170, carrier: 'stationary', advanceBandDeg: [14, 22] }],
    ['strip', { kind: 'strip', diameterMm: 150, windowCrankDeg: [320, 10] }],
    ['scribe', { kind: 'scribe', diameterMm: 110, fromDeg: 10, toDeg: 30, stepDeg: 0.5 }],
    ['check', { kind: 'check', paper: 'Letter' }],
  ] as Array<[string, SheetRequestInput]>)('a %s sheet: one PDF page per layout page, the print line on the first', async (_, input) => {
    const { drawing } = sheet(input);
    const { text, pageCount } = await readPdfText(await renderSheetPdf(drawing));
    expect(pageCount).toBe(drawing.pages.length);
    expect(text).toContain('Print at 100 %');
  });
});
