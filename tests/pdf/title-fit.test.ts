// Source under test: lib/sheet/info-panel.ts (title wrap and shrink) through buildDrawing and
// renderSheetPdf, measured with poppler's `pdftotext -bbox` (a PDF text extractor no one here wrote):
// every word box lies inside the page less the 6 mm unprintable margin. PDF units: 1 pt = 1/72 in
// (ISO 32000-1 §8.3.2.3), 1 in = 25.4 mm.
import { execFileSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { buildDrawing } from '@/lib/sheet/build-drawing';
import { sheetRequestSchema, type SheetRequestInput } from '@/lib/sheet/sheet-request';
import { renderSheetPdf } from '@/pdf/render-sheet-pdf';

const PT_PER_MM = 72 / 25.4;

async function wordBoxes(input: SheetRequestInput) {
  const pdf = await renderSheetPdf(buildDrawing(sheetRequestSchema.parse(input), { date: new Date('2026-12-01T12:00:00Z') }));
  const dir = mkdtempSync(path.join(tmpdir(), 'rimscale-bbox-'));
  try {
    writeFileSync(path.join(dir, 'sheet.pdf'), pdf);
    const html = execFileSync('pdftotext', ['-bbox', 'sheet.pdf', '-'], { cwd: dir, encoding: 'utf8' });
    const pages = [...html.matchAll(/<page width="([\d.]+)" height="([\d.]+)">([\s\S]*?)<\/page>/g)];
    return pages.map(([, w, h, body]) => ({
      widthPt: Number(w),
      heightPt: Number(h),
      words: [...body!.matchAll(/<word xMin="([\d.]+)" yMin="([\d.]+)" xMax="([\d.]+)" yMax="([\d.]+)">([^<]*)<\/word>/g)].map((m) => ({ xMin: Number(m[1]), yMin: Number(m[2]), xMax: Number(m[3]), yMax: Number(m[4]), text: m[5]! })),
    }));
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

describe('text fits the printable page', () => {
  it.each([
    ['a 66-character upper-case title on a wheel', { kind: 'wheel', diameterMm: 150, title: 'WORKSHOP TIMING WHEEL FOR THE BLUE TWO STROKE SCOOTER ENGINE NO 12' }],
    ['the same title on a strip', { kind: 'strip', diameterMm: 90, title: 'WORKSHOP TIMING WHEEL FOR THE BLUE TWO STROKE SCOOTER ENGINE NO 12' }],
    ['an 80-character lower-case title on a ring', { kind: 'ring', innerDiameterMm: 130, outerDiameterMm: 160, title: 'workshop flange ring for the blue two stroke scooter engine number twelve, spare' }],
  ] as const)('%s: every pdftotext word box within the page less 6 mm', async (_, input) => {
    expect(input.title.length).toBeGreaterThanOrEqual(66);
    const pages = await wordBoxes(input);
    expect(pages.length).toBeGreaterThan(0);
    const margin = 6 * PT_PER_MM;
    for (const page of pages) {
      expect(page.words.length).toBeGreaterThan(10);
      for (const word of page.words) {
        expect(word.xMin, word.text).toBeGreaterThanOrEqual(margin - 0.5);
        expect(word.xMax, word.text).toBeLessThanOrEqual(page.widthPt - margin + 0.5);
        expect(word.yMin, word.text).toBeGreaterThanOrEqual(margin - 0.5);
        expect(word.yMax, word.text).toBeLessThanOrEqual(page.heightPt - margin + 0.5);
      }
    }
  }, 60_000);
});
