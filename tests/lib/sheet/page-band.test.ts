// Source under test: lib/sheet/page-band.ts and the page order in lib/sheet/page-layout.ts and
// lib/sheet/build-drawing.ts, read back from the SVG with @xmldom/xmldom.
// Page sizes: ISO 216 (A4 210 × 297 mm). Minimum margin 6 mm: DEVELOPERS.md, "Sheets".
import type { Element as XmlElement } from '@xmldom/xmldom';
import { describe, expect, it } from 'vitest';
import { buildDrawing } from '@/lib/sheet/build-drawing';
import type { Drawing, TextShape } from '@/lib/sheet/drawing';
import { renderSvg } from '@/lib/sheet/render-svg';
import type { SheetRequestInput } from '@/lib/sheet/sheet-request';
import { pageBandHeightMm, pageBandShapes } from '@/lib/sheet/page-band';
import { PRINT_AT_100 } from '@/lib/sheet/sheet-notes';
import { expectPagesPrintable } from './sheet-checks';
import { FIXED_DATE, n, parseSvg, req, type Svg } from './svg-measure';

const A4_HEIGHT_MM = 297; // ISO 216
const BIG_WHEEL: SheetRequestInput = {
  kind: 'wheel',
  diameterMm: 180,
  numbering: 'full',
  portEvents: [
    { name: 'Exhaust', opensCrankDeg: 92, closesCrankDeg: 268 },
    { name: 'Transfer', opensCrankDeg: 120, closesCrankDeg: 240 },
  ],
};

function build(input: Parameters<typeof req>[0]): { drawing: Drawing; svg: Svg } {
  const drawing = buildDrawing(req(input), { date: FIXED_DATE });
  return { drawing, svg: parseSvg(renderSvg(drawing)) };
}

/** The page (0-based) a stacked drawing's element lies on, from its y in drawing mm. */
function pageOfY(yMm: number): number {
  return Math.floor(yMm / A4_HEIGHT_MM);
}

function byRole(svg: Svg, tag: string, role: string): XmlElement[] {
  return svg.all(tag).filter((el) => el.getAttribute('data-role') === role);
}

/** Every whole page of the SVG carries title, "page N of M", the print line and a 100 mm horizontal bar. */
function expectBandOnEveryPage(drawing: Drawing, svg: Svg): void {
  const count = drawing.pages.length;
  const titles = byRole(svg, 'text', 'page-title');
  const numbers = byRole(svg, 'text', 'page-number');
  const printLines = byRole(svg, 'text', 'page-print-line');
  const bars = byRole(svg, 'line', 'page-check-bar');
  drawing.pages.forEach((page, index) => {
    const onPage = (el: XmlElement, attr: string) => {
      const y = n(el, attr);
      return y >= page.viewportMm.yMm && y <= page.viewportMm.yMm + page.viewportMm.heightMm;
    };
    // A long title wraps onto a second row: its rows read back as the whole title.
    expect(titles.filter((el) => onPage(el, 'y')).map((el) => el.textContent).join(' ')).toBe(drawing.title);
    expect(numbers.filter((el) => onPage(el, 'y')).map((el) => el.textContent)).toEqual([`page ${index + 1} of ${count}`]);
    expect(printLines.filter((el) => onPage(el, 'y')).map((el) => el.textContent)).toEqual([PRINT_AT_100]);
    const bar = bars.filter((el) => onPage(el, 'y1'));
    expect(bar).toHaveLength(1);
    expect(n(bar[0]!, 'x2') - n(bar[0]!, 'x1')).toBeCloseTo(100, 6);
    expect(n(bar[0]!, 'y2')).toBe(n(bar[0]!, 'y1'));
    expect(bar[0]!.getAttribute('data-check-mm')).toBe('100');
    expect(bar[0]!.getAttribute('data-axis')).toBe('x');
  });
}

describe('page band on multi-page sheets', () => {
  it('a 180 mm full wheel with two ports on A4 portrait: the wheel alone on page 1, the info page 2, both banded', () => {
    const { drawing, svg } = build(BIG_WHEEL);
    expect(drawing.pages).toHaveLength(2);
    expectPagesPrintable(drawing);
    expectBandOnEveryPage(drawing, svg);
    const cut = byRole(svg, 'circle', 'cut-line')[0]!;
    expect(pageOfY(n(cut, 'cy'))).toBe(0);
    expect(n(cut, 'r')).toBeCloseTo(90, 6);
    // The full scale check (four bars and the card) is on the info page, page 2.
    const checkBars = byRole(svg, 'line', 'check-bar');
    expect(checkBars).toHaveLength(4);
    for (const bar of checkBars) expect(pageOfY(n(bar, 'y1'))).toBe(1);
    expect(pageOfY(n(byRole(svg, 'rect', 'card')[0]!, 'y'))).toBe(1);
    // The wheel starts below the band's rule, so the band never covers the cut line.
    const rule = byRole(svg, 'line', 'page-band-rule').find((el) => pageOfY(n(el, 'y1')) === 0)!;
    expect(n(cut, 'cy') - n(cut, 'r')).toBeGreaterThan(n(rule, 'y1'));
  });

  it('a long strip over several pages carries the band on each', () => {
    const { drawing, svg } = build({ kind: 'strip', diameterMm: 600, stripWidthMm: 40 });
    expect(drawing.pages.length).toBeGreaterThan(1);
    expectPagesPrintable(drawing);
    expectBandOnEveryPage(drawing, svg);
  });

  it('a long scribe chart over several pages carries the band on each', () => {
    const { drawing, svg } = build({ kind: 'scribe', diameterMm: 120, fromDeg: 0, toDeg: 180, stepDeg: 0.5 });
    expect(drawing.pages.length).toBeGreaterThan(1);
    expectPagesPrintable(drawing);
    expectBandOnEveryPage(drawing, svg);
  });

  it('a tiled 500 mm wheel: tiles first, each with its band (tile name, page N of M, 100 mm bar), the info page last', () => {
    const { drawing, svg } = build({ kind: 'wheel', diameterMm: 500, title: 'Big disc' });
    expectPagesPrintable(drawing);
    const count = drawing.pages.length;
    const tiles = drawing.pages.slice(0, -1);
    tiles.forEach((tile, index) => {
      const texts = tile.pageShapes.filter((s): s is TextShape => s.type === 'text');
      const tileLabel = texts.find((s) => s.data?.role === 'tile-label')!.text;
      const name = /^Tile (\w+)/.exec(tileLabel)![1];
      expect(texts.find((s) => s.data?.role === 'page-title')!.text).toBe(`Big disc · tile ${name}`);
      expect(texts.find((s) => s.data?.role === 'page-number')!.text).toBe(`page ${index + 1} of ${count}`);
      expect(texts.find((s) => s.data?.role === 'page-print-line')!.text).toBe(PRINT_AT_100);
      const bar = tile.pageShapes.find((s) => s.data?.role === 'page-check-bar')!;
      expect(bar.type === 'line' && bar.x2Mm - bar.x1Mm).toBeCloseTo(100, 6);
      // The band sits above the clipped viewport, so nothing of the wheel prints over it.
      const rule = tile.pageShapes.find((s) => s.data?.role === 'page-band-rule')!;
      expect(rule.type === 'line' && rule.y1Mm).toBeLessThan(tile.originMm[1]);
    });
    const info = drawing.pages.at(-1)!;
    expect(info.originMm).toEqual([0, 0]);
    expect(info.viewportMm.yMm).toBe(0);
    // The info page's band is in the SVG, at the top of region 0, with the last page number.
    const number = byRole(svg, 'text', 'page-number').find((el) => n(el, 'y') < A4_HEIGHT_MM)!;
    expect(number.textContent).toBe(`page ${count} of ${count}`);
    expect(byRole(svg, 'line', 'check-bar').every((el) => n(el, 'y1') < A4_HEIGHT_MM)).toBe(true);
  });

  it('pre-scales the band bar by the printer correction like the rest of the sheet', () => {
    const { svg } = build({ ...BIG_WHEEL, printerScaleX: 1.02 });
    const bars = byRole(svg, 'line', 'page-check-bar');
    expect(bars).toHaveLength(2);
    // The SVG writes 4 decimals (render-svg.ts num()), so compare to 0.001 mm.
    for (const bar of bars) expect(n(bar, 'x2') - n(bar, 'x1')).toBeCloseTo(100 / 1.02, 3);
  });

  it('a long title wraps to two rows and then shrinks, never cut, on every page alike', () => {
    const title = 'WORKSHOP TIMING WHEEL FOR THE BLUE TWO STROKE SCOOTER ENGINE NUMBER TWELVE SPARE';
    expect(title.length).toBe(80);
    // 120 mm leaves about 100 mm beside "page N of M": one row will not hold it.
    const widthMm = 120;
    const band = pageBandShapes({ title, pageNumber: 1, pageCount: 3, widthMm, tileName: 'B2' }).filter((s): s is TextShape => s.type === 'text');
    const rows = band.filter((s) => s.data?.role === 'page-title');
    expect(rows.map((r) => r.text).join(' ')).toBe(`${title} · tile B2`);
    expect(rows.some((r) => r.text.includes('…'))).toBe(false);
    expect(rows.length).toBeGreaterThanOrEqual(2);
    const number = band.find((s) => s.data?.role === 'page-number')!;
    const printLine = band.find((s) => s.data?.role === 'page-print-line')!;
    for (const row of rows) {
      // Bold capitals of DejaVu Sans run up to about 0.75 em (from memory): the row ends short of "page N of M".
      expect(row.text.length * row.sizeMm * 0.75, row.text).toBeLessThanOrEqual(widthMm - number.text.length * number.sizeMm * 0.75);
      expect(row.yMm).toBeLessThan(printLine.yMm - printLine.sizeMm);
    }
    // Two rows, then smaller: three rows only at the smallest size.
    if (rows.length > 2) expect(rows[0]!.sizeMm).toBeCloseTo(1.8, 6);
    // The band grows with the second row, and every page's band is as deep (the height holds the longest tile name).
    expect(pageBandHeightMm(widthMm, title)).toBeGreaterThan(pageBandHeightMm(widthMm, 'Wheel'));
    const other = pageBandShapes({ title, pageNumber: 3, pageCount: 3, widthMm }).find((s) => s.data?.role === 'page-band-rule')!;
    const rule = pageBandShapes({ title, pageNumber: 1, pageCount: 3, widthMm, tileName: 'B2' }).find((s) => s.data?.role === 'page-band-rule')!;
    expect(other).toEqual(rule);
  });

  it('a multi-page sheet with an 80-capital title on a printer that shrinks x: two title rows above the rule on every page, the pages printable', () => {
    const title = 'WORKSHOP TIMING WHEEL FOR THE BLUE TWO STROKE SCOOTER ENGINE NUMBER TWELVE SPARE';
    const { drawing } = build({ ...BIG_WHEEL, title, printerScaleX: 0.9 });
    expect(drawing.pages.length).toBeGreaterThan(1);
    expectPagesPrintable(drawing);
    drawing.pages.forEach((page) => {
      // A whole page's band is in the drawing (and the SVG), a tile's in its page shapes.
      const whole = page.originMm[0] === 0 && page.originMm[1] === 0;
      const v = page.viewportMm;
      const shapes = whole ? drawing.shapes.filter((s) => s.type === 'text' || s.type === 'line').filter((s) => (s.type === 'text' ? s.yMm : s.type === 'line' ? s.y1Mm : -1) >= v.yMm && (s.type === 'text' ? s.yMm : s.type === 'line' ? s.y1Mm : -1) <= v.yMm + v.heightMm) : page.pageShapes;
      const rows = shapes.filter((s): s is TextShape => s.type === 'text' && s.data?.role === 'page-title');
      // The tiles' headings take two rows, "· tile A1" kept whole on the second; the info page's title alone fits one.
      expect(rows).toHaveLength(whole ? 1 : 2);
      expect(rows.map((r) => r.text).join(' ')).toMatch(new RegExp(`^${title}( · tile \\w+)?$`));
      if (!whole) expect(rows[1]!.text).toMatch(/· tile \w+$/);
      const rule = shapes.find((s) => s.data?.role === 'page-band-rule')!;
      for (const row of rows) expect(row.yMm).toBeLessThan(rule.type === 'line' ? rule.y1Mm : 0);
    });
  });

  it('a sheet that fits one page has no band: its info panel already says it all', () => {
    const { drawing, svg } = build({ kind: 'wheel', diameterMm: 120 });
    expect(drawing.pages).toHaveLength(1);
    expect(byRole(svg, 'text', 'page-number')).toHaveLength(0);
    expect(byRole(svg, 'text', 'print-at-100').length).toBeGreaterThan(0);
  });
});
