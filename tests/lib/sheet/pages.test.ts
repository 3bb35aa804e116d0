// Source under test: lib/sheet/page-layout.ts (pages, stacking, tiling) via lib/sheet/build-drawing.ts.
// Page sizes: ISO 216 (A4 210 × 297 mm, A3 297 × 420 mm) and ANSI/ASME Y14.1 (Letter 8.5 × 11 in,
// Legal 8.5 × 14 in, Tabloid 11 × 17 in; 1 in = 25.4 mm exactly).
import { describe, expect, it } from 'vitest';
import { buildDrawing } from '@/lib/sheet/build-drawing';
import { tileStarts } from '@/lib/sheet/page-layout';
import { expectPagesPrintable } from './sheet-checks';
import { FIXED_DATE, req } from './svg-measure';

const build = (input: Parameters<typeof req>[0]) => buildDrawing(req(input), { date: FIXED_DATE });

describe('pages', () => {
  it.each([
    ['A4', 'portrait', 210, 297],
    ['A4', 'landscape', 297, 210],
    ['A3', 'portrait', 297, 420],
    ['Letter', 'portrait', 215.9, 279.4],
    ['Legal', 'landscape', 355.6, 215.9],
    ['Tabloid', 'portrait', 279.4, 431.8],
  ] as const)('%s %s pages are %s × %s mm', (paper, orientation, w, h) => {
    // Small enough to fit one page either way round, so the orientation asked for is kept.
    const drawing = build({ kind: 'wheel', diameterMm: 80, paper, orientation });
    for (const page of drawing.pages) expect(page.sizeMm).toEqual({ widthMm: w, heightMm: h });
    expectPagesPrintable(drawing);
  });

  it('a 150 mm wheel fits one A4 page, and the page is the whole drawing', () => {
    const drawing = build({ kind: 'wheel', diameterMm: 150, advanceMarksDeg: [18] });
    expect(drawing.pages).toHaveLength(1);
    expect(drawing.pages[0]!.viewportMm).toEqual({ xMm: 0, yMm: 0, widthMm: 210, heightMm: 297 });
    expect(drawing.sizeMm).toEqual({ widthMm: 210, heightMm: 297 });
    expectPagesPrintable(drawing);
  });

  it('tiles a 500 mm wheel on A4: overlapping tiles that cover the whole wheel, then an info page', () => {
    const drawing = build({ kind: 'wheel', diameterMm: 500 });
    expectPagesPrintable(drawing);
    const tiles = drawing.pages.slice(0, -1);
    expect(tiles.length).toBeGreaterThanOrEqual(6);
    const [cx, cy] = drawing.centreMm!;
    // Every point of the cut circle (sampled every degree) and every tick lies wholly on some tile.
    const onSomeTile = (x: number, y: number) =>
      tiles.some(({ viewportMm: v }) => x >= v.xMm - 1e-6 && x <= v.xMm + v.widthMm + 1e-6 && y >= v.yMm - 1e-6 && y <= v.yMm + v.heightMm + 1e-6);
    for (let deg = 0; deg < 360; deg += 1) {
      const t = (deg * Math.PI) / 180;
      expect(onSomeTile(cx + 250 * Math.sin(t), cy - 250 * Math.cos(t))).toBe(true);
    }
    for (const s of drawing.shapes)
      if (s.type === 'line' && s.data?.level !== undefined)
        expect(tiles.some(({ viewportMm: v }) => [s.x1Mm, s.x2Mm].every((x) => x >= v.xMm && x <= v.xMm + v.widthMm) && [s.y1Mm, s.y2Mm].every((y) => y >= v.yMm && y <= v.yMm + v.heightMm))).toBe(true);
    // Registration crosses: each appears whole on at least two tiles (in their overlap).
    const crosses = drawing.shapes.filter((s) => s.type === 'ellipse' && s.data?.role === 'registration');
    expect(crosses.length).toBeGreaterThan(0);
    for (const cross of crosses) {
      if (cross.type !== 'ellipse') continue;
      const holding = tiles.filter(({ viewportMm: v }) => cross.cxMm - 3 >= v.xMm && cross.cxMm + 3 <= v.xMm + v.widthMm && cross.cyMm - 3 >= v.yMm && cross.cyMm + 3 <= v.yMm + v.heightMm);
      expect(holding.length).toBeGreaterThanOrEqual(2);
    }
    // Each tile is labelled on its page.
    expect(tiles.every((t) => t.pageShapes.some((s) => s.type === 'text' && s.data?.role === 'tile-label'))).toBe(true);
    expect(drawing.warnings.some((w) => w.includes('tiles'))).toBe(true);
  });

  it('spreads tiles evenly with at least the overlap between neighbours', () => {
    const starts = tileStarts(500, 194, 12);
    expect(starts[0]).toBe(0);
    expect(starts.at(-1)! + 194).toBeCloseTo(500, 9);
    for (let i = 1; i < starts.length; i += 1) expect(starts[i - 1]! + 194 - starts[i]!).toBeGreaterThanOrEqual(12);
    expect(tileStarts(150, 194, 12)).toEqual([0]);
  });

  it('puts a long strip’s rows on as many pages as needed, each page printable', () => {
    const drawing = build({ kind: 'strip', diameterMm: 600, stripWidthMm: 40 });
    expect(drawing.pages.length).toBeGreaterThan(1);
    expectPagesPrintable(drawing);
  });
});

describe('no spurious tiling', () => {
  it('a 130/160 mm flange ring on A4 portrait is one page, ring and info panel together, untiled', () => {
    const drawing = build({ kind: 'ring', innerDiameterMm: 130, outerDiameterMm: 160, advanceMarksDeg: [18], advanceBandDeg: [16, 20] });
    expect(drawing.pages).toHaveLength(1);
    expect(drawing.pages[0]!.sizeMm).toEqual({ widthMm: 210, heightMm: 297 }); // ISO 216 A4 portrait
    expect(drawing.warnings.some((w) => /tiles|Laid out/.test(w))).toBe(false);
    expectPagesPrintable(drawing);
  });

  it('turns the page when the other orientation holds the sheet on one page, and says so', () => {
    // A 150 mm wheel asked on A4 landscape: 194 mm of printable height takes the wheel but not the panel
    // below it, nor beside it; A4 portrait holds both.
    const drawing = build({ kind: 'wheel', diameterMm: 150, orientation: 'landscape', advanceMarksDeg: [18] });
    expect(drawing.pages).toHaveLength(1);
    expect(drawing.pages[0]!.sizeMm).toEqual({ widthMm: 210, heightMm: 297 });
    expect(drawing.warnings).toContain('Laid out on A4 portrait: it fits one page that way, not landscape');
    expectPagesPrintable(drawing);
  });

  it('a 500 mm wheel still tiles on A4, its cut circle exactly 500 mm, with registration crosses near every tile corner that has neighbours', () => {
    const drawing = build({ kind: 'wheel', diameterMm: 500 });
    const tiles = drawing.pages.slice(0, -1);
    expect(tiles.length).toBeGreaterThan(1);
    const cut = drawing.shapes.find((s) => s.type === 'ellipse' && s.data?.role === 'cut-line');
    expect(cut?.type === 'ellipse' && cut.rxMm).toBe(250);
    const crosses = drawing.shapes.flatMap((s) => (s.type === 'ellipse' && s.data?.role === 'registration' ? [[s.cxMm, s.cyMm] as const] : []));
    for (const a of tiles)
      for (const b of tiles) {
        const va = a.viewportMm;
        const vb = b.viewportMm;
        // Horizontal neighbours (same row, overlapping columns): crosses in the overlap within 12 mm of the top and bottom corners.
        if (va.yMm !== vb.yMm || !(vb.xMm > va.xMm && vb.xMm < va.xMm + va.widthMm)) continue;
        const inOverlap = crosses.filter(([x]) => x > vb.xMm && x < va.xMm + va.widthMm);
        expect(inOverlap.some(([, y]) => y - va.yMm < 12 && y > va.yMm)).toBe(true);
        expect(inOverlap.some(([, y]) => va.yMm + va.heightMm - y < 12 && y < va.yMm + va.heightMm)).toBe(true);
      }
  });
});
