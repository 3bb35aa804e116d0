import { OPS } from 'pdfjs-dist/legacy/build/pdf.mjs';
import { describe, expect, it } from 'vitest';
import type { Drawing } from '@/lib/sheet/drawing';
import { renderSheetPdf } from '@/pdf/render-sheet-pdf';
import { FIXTURE_CENTRE_MM, fixtureDrawing, fixtureShapes } from './fixture-drawing';
import { nearestSegment, openPdf, readPdfGeometry, segmentLengthMm, type Segment } from './read-pdf-geometry';
import { readPdfText } from './read-pdf-text';

/**
 * The PDF renderer on hand-made drawings (tests/pdf/fixture-drawing.ts), read
 * back with pdf-parse (text, metadata, page size) and pdfjs-dist (drawing ops).
 */

const horizontal = (s: Segment) => Math.abs(s.y1Mm - s.y2Mm) < 1e-3 && Math.abs(s.x1Mm - s.x2Mm) > 1;
const vertical = (s: Segment) => Math.abs(s.x1Mm - s.x2Mm) < 1e-3 && Math.abs(s.y1Mm - s.y2Mm) > 1;

describe('renderSheetPdf on a fixture drawing', () => {
  it('keeps the labels, title and print line as extractable text (pdf-parse)', async () => {
    const { text, info } = await readPdfText(await renderSheetPdf(fixtureDrawing()));
    expect(text).toContain('18° BTDC'); // rotated −18°, still one run of text
    expect(text).toContain('Fixture wheel 80 mm');
    expect(text).toContain('Print at 100 % / actual size — turn off fit-to-page');
    expect(info.Title).toBe('Fixture wheel 80 mm');
    expect(info.Author).toBe('Rimscale');
    expect(String(info.Subject)).toMatch(/100 %/);
  });

  // ISO 216: A4 is 210 × 297 mm; ANSI/ASME Y14.1: Letter is 8.5 × 11 in. ISO 32000-1 §8.3.2.3: 1 pt = 1/72 in.
  it.each([
    ['A4', 'portrait', 595.28, 841.89],
    ['A4', 'landscape', 841.89, 595.28],
    ['Letter', 'portrait', 612, 792],
    ['Letter', 'landscape', 792, 612],
  ] as const)('a %s %s page is %s × %s pt', async (paper, orientation, widthPt, heightPt) => {
    const { pages } = await readPdfText(await renderSheetPdf(fixtureDrawing({ paper, orientation })));
    expect(pages).toHaveLength(1);
    expect(pages[0]!.widthPt).toBeCloseTo(widthPt, 1); // ±0.05 pt; the ISO figures are rounded to 0.01 pt
    expect(pages[0]!.heightPt).toBeCloseTo(heightPt, 1);
  });

  it('draws the 100 mm and 4 in check bars at 100 and 101.6 mm in both axes (pdfjs operator list, ± 0.01 mm)', async () => {
    const [page] = await readPdfGeometry(await renderSheetPdf(fixtureDrawing()));
    const lengths = (pick: (s: Segment) => boolean) => page!.segments.filter(pick).map(segmentLengthMm);
    const near = (values: number[], target: number) => values.some((v) => Math.abs(v - target) <= 0.01);
    // 4 in = 101.6 mm exactly (international inch, 1959).
    expect(near(lengths(horizontal), 100)).toBe(true);
    expect(near(lengths(horizontal), 101.6)).toBe(true);
    expect(near(lengths(vertical), 100)).toBe(true);
    expect(near(lengths(vertical), 101.6)).toBe(true);
  });

  it('puts every tick end where the drawing has it, within 0.01 mm, and the wheel about its centre', async () => {
    const drawing = fixtureDrawing();
    const [page] = await readPdfGeometry(await renderSheetPdf(drawing));
    const ticks = drawing.shapes.filter((s) => s.type === 'line' && s.data?.crankDeg !== undefined);
    expect(ticks).toHaveLength(36);
    for (const tick of ticks) {
      if (tick.type !== 'line') continue;
      const found = nearestSegment(page!.segments, tick.x1Mm, tick.y1Mm, tick.x2Mm, tick.y2Mm);
      expect(found!.distanceMm).toBeLessThan(0.01);
      // Independent of the fixture's numbers: the outer end is 40 mm from the centre.
      const [cx, cy] = FIXTURE_CENTRE_MM;
      expect(Math.hypot(found!.segment.x1Mm - cx, found!.segment.y1Mm - cy)).toBeCloseTo(40, 2);
    }
  });

  it('scales only the horizontal bar when the drawing is pre-scaled in x', async () => {
    const drawing = fixtureDrawing({ scaleX: 1 / 0.98 });
    const [page] = await readPdfGeometry(await renderSheetPdf(drawing));
    const lengths = (pick: (s: Segment) => boolean) => page!.segments.filter(pick).map(segmentLengthMm);
    expect(lengths(horizontal).some((v) => Math.abs(v - 102.04) <= 0.01)).toBe(true); // 100 / 0.98 = 102.0408…
    expect(lengths(vertical).some((v) => Math.abs(v - 100) <= 0.01)).toBe(true);
  });

  it('draws a tiled drawing page by page, each part moved to its page origin', async () => {
    const tiled: Drawing = {
      sizeMm: { widthMm: 300, heightMm: 150 },
      shapes: [
        { type: 'line', x1Mm: 145, y1Mm: 60, x2Mm: 145, y2Mm: 70, strokeMm: 0.2, data: { role: 'shared-tick' } },
        { type: 'line', x1Mm: 20, y1Mm: 60, x2Mm: 20, y2Mm: 75, strokeMm: 0.2 },
        { type: 'line', x1Mm: 280, y1Mm: 60, x2Mm: 280, y2Mm: 80, strokeMm: 0.2 },
      ],
      pages: [
        { sizeMm: { widthMm: 297, heightMm: 210 }, viewportMm: { xMm: 0, yMm: 0, widthMm: 150, heightMm: 150 }, originMm: [10, 20], pageShapes: [] },
        {
          sizeMm: { widthMm: 297, heightMm: 210 },
          viewportMm: { xMm: 140, yMm: 0, widthMm: 160, heightMm: 150 },
          originMm: [10, 20],
          pageShapes: [{ type: 'text', xMm: 10, yMm: 200, text: 'Tile 2 of 2', sizeMm: 3, anchor: 'start', rotateDeg: 0, weight: 'normal', font: 'ui' }],
        },
      ],
      warnings: [],
      title: 'Tiled fixture',
    };
    const pdf = await renderSheetPdf(tiled);
    const pages = await readPdfGeometry(pdf);
    expect(pages).toHaveLength(2);
    // The tick at drawing x = 145 lies in both viewports: page x = 10 + 145 − 0 and 10 + 145 − 140.
    expect(nearestSegment(pages[0]!.segments, 155, 80, 155, 90)!.distanceMm).toBeLessThan(0.01);
    expect(nearestSegment(pages[1]!.segments, 15, 80, 15, 90)!.distanceMm).toBeLessThan(0.01);
    expect(nearestSegment(pages[1]!.segments, 150, 80, 150, 100)!.distanceMm).toBeLessThan(0.01);
    expect((await readPdfText(pdf)).text).toContain('Tile 2 of 2');
  });
});

describe('fills that print on a mono laser', () => {
  async function operators(drawing: Drawing) {
    const doc = await openPdf(await renderSheetPdf(drawing));
    const list = await (await doc.getPage(1)).getOperatorList();
    await doc.destroy();
    return list;
  }

  it("paints 'grey15' as 15 % grey (85 % white) and 'hatch' as black 45° lines under a clip", async () => {
    const drawing = fixtureDrawing();
    drawing.shapes = fixtureShapes().filter((s) => s.type === 'path');
    const list = await operators(drawing);
    const fills = list.fnArray.flatMap((fn, i) => (fn === OPS.setFillRGBColor ? [list.argsArray[i]] : []));
    expect(fills.map(String)).toContain('#d9d9d9'); // 0.85 × 255 = 216.75 → 0xd9
    expect(list.fnArray).toContain(OPS.clip);
    const [page] = await readPdfGeometry(await renderSheetPdf(drawing));
    const diagonals = page!.segments.filter(
      (s) => Math.abs(s.x2Mm - s.x1Mm + (s.y2Mm - s.y1Mm)) < 1e-3 && segmentLengthMm(s) > 1,
    );
    // Lines x + y = c, 1.2 mm apart square to the lines, so c steps by 1.2·√2; the 30 × 10 mm box spans 40 mm of c.
    const offsets = diagonals.map((s) => s.x1Mm + s.y1Mm).sort((a, b) => a - b);
    expect(offsets.length).toBeGreaterThanOrEqual(Math.floor(40 / (1.2 * Math.SQRT2)));
    const gapsMm = offsets.slice(1).map((c, i) => (c - offsets[i]!) / Math.SQRT2);
    for (const gap of gapsMm) expect(gap).toBeCloseTo(1.2, 3);
  });
});
