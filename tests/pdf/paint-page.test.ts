// Source under test: the page band (lib/sheet/page-band.ts) as printed: pdf/render-sheet-pdf.ts,
// read back with pdfjs-dist's operator list (text runs per page, tests/pdf/read-pdf-geometry.ts).
// 1 pt = 1/72 in (ISO 32000-1 §8.3.2.3); A4 = 210 × 297 mm (ISO 216).
import { describe, expect, it } from 'vitest';
import { buildDrawing } from '@/lib/sheet/build-drawing';
import { sheetRequestSchema, type SheetRequestInput } from '@/lib/sheet/sheet-request';
import { renderSheetPdf } from '@/pdf/render-sheet-pdf';
import { readPdfGeometry, readPdfTextItems, segmentLengthMm, type TextItem } from './read-pdf-geometry';

const DATE = new Date('2026-03-01T00:00:00Z');
const PORTS = [
  { name: 'Exhaust', opensCrankDeg: 92, closesCrankDeg: 268 },
  { name: 'Transfer', opensCrankDeg: 120, closesCrankDeg: 240 },
];

async function printed(input: SheetRequestInput) {
  const drawing = buildDrawing(sheetRequestSchema.parse(input), { date: DATE });
  const pdf = await renderSheetPdf(drawing);
  // Runs outside the page (drawn, then clipped away) are not printed: keep those on the A4 sheet.
  const onSheet = (item: TextItem) => item.xMm >= 0 && item.xMm <= 210 && item.yMm >= 0 && item.yMm <= 297;
  return { drawing, items: (await readPdfTextItems(pdf)).filter(onSheet), geometry: await readPdfGeometry(pdf) };
}

describe('every printed page of a multi-page sheet says what it is and how to print it', () => {
  it.each([
    ['a 180 mm full wheel with ports on A4 portrait', { kind: 'wheel', diameterMm: 180, numbering: 'full', portEvents: PORTS, title: 'Shop wheel 180' }],
    ['a tiled 400 mm wheel', { kind: 'wheel', diameterMm: 400, title: 'Shop wheel 400' }],
    ['a 600 mm strip', { kind: 'strip', diameterMm: 600, stripWidthMm: 40, title: 'Shop strip 600' }],
  ] as Array<[string, SheetRequestInput]>)('%s: title, page N of M, print line and a 100 mm bar on each page', async (_, input) => {
    const { drawing, items, geometry } = await printed(input);
    const count = drawing.pages.length;
    expect(count).toBeGreaterThan(1);
    for (let page = 1; page <= count; page += 1) {
      const texts = items.filter((item) => item.page === page).map((item) => item.text);
      expect(texts.some((t) => t.startsWith(input.title!))).toBe(true);
      expect(texts).toContain(`page ${page} of ${count}`);
      expect(texts.some((t) => t.startsWith('Print at 100 %'))).toBe(true);
      // A horizontal segment 100 mm long (± 0.01 mm) inside the top 30 mm: the band's check bar.
      const bars = geometry[page - 1]!.segments.filter((s) => Math.abs(s.y1Mm - s.y2Mm) < 1e-3 && s.y1Mm > 0 && s.y1Mm < 30 && Math.abs(segmentLengthMm(s) - 100) < 0.01);
      expect(bars.length).toBeGreaterThanOrEqual(1);
    }
  });

  it('a wheel too tall for its info panel prints the wheel first, the scale check on the page after', async () => {
    const { items } = await printed({ kind: 'wheel', diameterMm: 180, numbering: 'full', portEvents: PORTS });
    expect(new Set(items.map((item) => item.page)).size).toBe(2);
    const onPage = (page: number) => items.filter((item) => item.page === page).map((item) => item.text);
    expect(onPage(1)).toContain('BDC');
    expect(onPage(1).some((t) => t.startsWith('Scale check'))).toBe(false);
    expect(onPage(2).some((t) => t.startsWith('Scale check'))).toBe(true);
  });
});
