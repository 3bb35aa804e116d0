// Source under test: lib/sheet/page-band.ts and the page order in lib/sheet/page-layout.ts and
// lib/sheet/build-drawing.ts, read back from the SVG with @xmldom/xmldom.
// Page sizes: ISO 216 (A4 210 × 297 mm). Minimum margin 6 mm: DEVELOPERS.md, "Sheets".
import type { Element as XmlElement } from '@xmldom/xmldom';
import { describe, expect, it } from 'vitest';
import { buildDrawing } from '@/lib/sheet/build-drawing';
import type { Drawing, TextShape } from '@/lib/sheet/drawing';
import { renderSvg } from '@/lib/sheet/render-svg';
import type { SheetRequestInput } from '@/lib/sheet/sheet-request';
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
    expect(titles.filter((el) => onPage(el, 'y')).map((el) => el.textContent)).toEqual([drawing.title]);
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

  it('a sheet that fits one page has no band: its info panel already says it all', () => {
    const { drawing, svg } = build({ kind: 'wheel', diameterMm: 120 });
    expect(drawing.pages).toHaveLength(1);
    expect(byRole(svg, 'text', 'page-number')).toHaveLength(0);
    expect(byRole(svg, 'text', 'print-at-100').length).toBeGreaterThan(0);
  });
});
