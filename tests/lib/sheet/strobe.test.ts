// Source under test: lib/sheet/strobe.ts, and the strobe-readable option through lib/sheet/wheel-layout.ts,
// lib/sheet/polar-scale.ts and lib/sheet/strip-layout.ts, measured on the output:
// - the SVG read back with @xmldom/xmldom (an independent XML parser); its width and height are in mm and its
//   viewBox in the same numbers, so one user unit is one millimetre (CSS Values 3 absolute units, SVG 1.1 §7.2);
// - the PDF read back with pdfjs-dist (font size = the Tf size under the text matrix and CTM, ISO 32000-1 §9.4.4)
//   and with poppler's `pdftotext -bbox`, whose word box runs from the font's ascent to its descent;
//   1 pt = 1/72 in (ISO 32000-1 §8.3.2.3), 1 in = 25.4 mm.
// What is measured is the height of the figures' ink: the font size × the height of a flat-topped digit ('1',
// 4, 7: from the baseline to the top) as the bold figures' TrueType file itself gives it, read with fontkit
// (an independent font parser). That is the height a reader sees, smaller than the font size (the em box).
import { execFileSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import type { Element as XmlElement } from '@xmldom/xmldom';
import { openSync } from 'fontkit';
import { describe, expect, it } from 'vitest';
import { buildDrawing } from '@/lib/sheet/build-drawing';
import { renderSvg } from '@/lib/sheet/render-svg';
import { sheetRequestSchema, type SheetRequestInput } from '@/lib/sheet/sheet-request';
import { chooseStrobeFit, strobeNumerals, strobeRangeBtdcDeg } from '@/lib/sheet/strobe';
import { renderSheetPdf } from '@/pdf/render-sheet-pdf';
import { MM_PER_PT, readPdfTextItems } from '@/tests/pdf/read-pdf-geometry';
import { centreOf, clockwiseDeg, FIXED_DATE, n, parseSvg, type Svg } from './svg-measure';
import { textBox } from './text-boxes';

// The face the PDF painter uses for bold figures (pdf/fonts.ts).
const FIGURES_BOLD = openSync(path.join(process.cwd(), 'fonts/DejaVuSansCondensed-Bold.ttf'));
const em = FIGURES_BOLD.unitsPerEm;
/** Baseline to top of the flat-topped '1', as a share of the font size. */
const DIGIT_HEIGHT_EM = FIGURES_BOLD.glyphForCodePoint('1'.codePointAt(0)!).bbox.maxY / em;
/** pdftotext's word box: ascent to descent (hhea), as a share of the font size. */
const WORD_BOX_EM = (FIGURES_BOLD.ascent - FIGURES_BOLD.descent) / em;
/** The height asked for (the issue: at least 5 mm). */
const MIN_FIGURE_MM = 5;

function sheet(input: SheetRequestInput) {
  const drawing = buildDrawing(sheetRequestSchema.parse(input), { date: FIXED_DATE });
  return { drawing, svg: parseSvg(renderSvg(drawing)) };
}

const byRole = (svg: Svg, tag: string, role: string) => svg.all(tag).filter((el) => el.getAttribute('data-role') === role);
const btdcOf = (el: XmlElement) => (360 - Number(el.getAttribute('data-crank-deg'))) % 360;

/** mm per SVG user unit: the root's width (in mm) over the viewBox width. */
function mmPerUnit(svg: Svg): number {
  const width = svg.root.getAttribute('width') ?? '';
  expect(width).toMatch(/mm$/);
  return parseFloat(width) / Number((svg.root.getAttribute('viewBox') ?? '').split(' ')[2]);
}

function figureInkMm(svg: Svg, el: XmlElement): number {
  return n(el, 'font-size') * mmPerUnit(svg) * DIGIT_HEIGHT_EM;
}

// Cases where the piece holds full-size figures, with the step the pitch allows (π·D·θ/360 at the figures'
// radius against two 0.63 em digits plus a gap, or one 0.95 em line across): worked out by hand.
const FULL_SIZE = [
  ['a 600 mm wheel, every 2°', { kind: 'wheel', diameterMm: 600, paper: 'A3' }, 2],
  ['a 280 mm wheel, every 5°', { kind: 'wheel', diameterMm: 280, paper: 'A3' }, 5],
  ['a 200/260 mm flange ring, every 5°', { kind: 'ring', innerDiameterMm: 200, outerDiameterMm: 260, carrier: 'stationary', paper: 'A3' }, 5],
  ['a 240 mm rim strip 25 mm wide, every 5°', { kind: 'strip', diameterMm: 240, stripWidthMm: 25 }, 5],
] as const;
const ADVANCE = { strobeReadable: true, advanceBandDeg: [16, 22] as [number, number], targetAdvanceDeg: 18, advanceMarksDeg: [16, 18, 22] };

describe('strobe-readable figures, measured on the SVG', () => {
  it.each(FULL_SIZE)('%s: every figure at least 5 mm tall, no note about them, the step named in the title block', (_, input, step) => {
    const { drawing, svg } = sheet({ ...input, ...ADVANCE });
    const figures = byRole(svg, 'text', 'strobe-numeral');
    expect(figures.length).toBeGreaterThanOrEqual(3);
    for (const el of figures) expect(figureInkMm(svg, el), el.textContent ?? '').toBeGreaterThanOrEqual(MIN_FIGURE_MM);
    expect(drawing.warnings.filter((w) => /Strobe/.test(w))).toEqual([]);
    // Twice the scale's own numerals (3.2 mm type), at the very least.
    const numeral = byRole(svg, 'text', 'numeral')[0]!;
    expect(n(figures[0]!, 'font-size')).toBeGreaterThan(2 * n(numeral, 'font-size'));
    // The info panel wraps its lines: read its words as one run.
    const sheetText = svg.all('text').map((el) => el.textContent).join(' ');
    expect(sheetText).toMatch(new RegExp(`Strobe-readable: figures every ${step}° from \\d+ to \\d+° BTDC, 5\\.\\d mm tall`));
  });

  it.each(FULL_SIZE)('%s: a figure at every step through the advance band, each on a heavy tick', (_, input, step) => {
    const { svg } = sheet({ ...input, ...ADVANCE });
    const figures = byRole(svg, 'text', 'strobe-numeral');
    const btdc = [...new Set(figures.map(btdcOf))].sort((a, b) => a - b);
    // Split numbering: each figure reads its own angle before TDC (DEVELOPERS.md, "Numbering").
    for (const el of figures) expect(Number(el.textContent)).toBe(btdcOf(el));
    for (let i = 1; i < btdc.length; i += 1) expect(btdc[i]! - btdc[i - 1]!).toBe(step);
    expect(btdc[0]).toBeLessThanOrEqual(16);
    expect(btdc.at(-1)).toBeGreaterThanOrEqual(22);
    const ticks = byRole(svg, 'line', 'strobe-tick');
    expect(new Set(ticks.map(btdcOf))).toEqual(new Set(btdc));
    for (const tick of ticks) expect(n(tick, 'stroke-width')).toBeGreaterThanOrEqual(0.3 - 1e-9);
    if (input.kind === 'strip') {
      // Along the strip: step × π·(D + t)/360 apart, t = 0.1 mm paper (the strip's length rule).
      const xs = ticks.map((t) => n(t, 'x1')).sort((a, b) => a - b);
      for (let i = 1; i < xs.length; i += 1) expect(xs[i]! - xs[i - 1]!).toBeCloseTo((step * Math.PI * (240 + 0.1)) / 360, 2);
    } else {
      // Round the wheel: step degrees apart as seen from the centre.
      const centre = centreOf(svg);
      const angles = ticks.map((t) => clockwiseDeg(centre, n(t, 'x1'), n(t, 'y1'))).sort((a, b) => a - b);
      for (let i = 1; i < angles.length; i += 1) expect(angles[i]! - angles[i - 1]!).toBeCloseTo(step, 2);
    }
  });

  it.each(FULL_SIZE)('%s: a white band under the figures, inside the cut outline', (_, input) => {
    const { svg } = sheet({ ...input, ...ADVANCE });
    const figures = byRole(svg, 'text', 'strobe-numeral').map(textBox);
    if (input.kind === 'strip') {
      const [band] = byRole(svg, 'rect', 'strobe-band');
      const cut = byRole(svg, 'rect', 'cut-line').find((r) => r.getAttribute('data-segment') === band!.getAttribute('data-segment'))!;
      expect(band!.getAttribute('fill')).toMatch(/^(#fff|#ffffff|white)$/i);
      const [x, y, w, h] = ['x', 'y', 'width', 'height'].map((a) => n(band!, a)) as [number, number, number, number];
      expect(x).toBeGreaterThanOrEqual(n(cut, 'x'));
      expect(x + w).toBeLessThanOrEqual(n(cut, 'x') + n(cut, 'width'));
      expect(y).toBeGreaterThanOrEqual(n(cut, 'y'));
      expect(y + h).toBeLessThanOrEqual(n(cut, 'y') + n(cut, 'height'));
      for (const box of figures.filter((f) => f.corners.every(([fx]) => fx >= x && fx <= x + w)))
        for (const [, fy] of box.corners) {
          expect(fy, box.text).toBeGreaterThanOrEqual(y - 1e-6);
          expect(fy, box.text).toBeLessThanOrEqual(y + h + 1e-6);
        }
      return;
    }
    const centre = centreOf(svg);
    const bands = byRole(svg, 'path', 'strobe-band');
    expect(bands.length).toBeGreaterThan(0);
    const points = bands.flatMap((b) => [...(b.getAttribute('d') ?? '').matchAll(/[ML](-?[\d.]+) (-?[\d.]+)/g)].map((m) => [Number(m[1]), Number(m[2])] as const));
    const radii = points.map(([x, y]) => Math.hypot(x - centre[0], y - centre[1]));
    const [inner, outer] = [Math.min(...radii), Math.max(...radii)];
    for (const b of bands) expect(b.getAttribute('fill')).toMatch(/^(#fff|#ffffff|white)$/i);
    // Within the cut outline: the disc, or the ring between its two cut circles.
    const cutR = (role: string) => svg.all('circle').filter((c) => c.getAttribute('data-role') === role).map((c) => n(c, 'r'))[0];
    expect(outer).toBeLessThanOrEqual(cutR('cut-line')! + 1e-6);
    if (input.kind === 'ring') expect(inner).toBeGreaterThanOrEqual(cutR('cut-line-inner')! - 1e-6);
    // Every figure's box lies on the band, and within the band's angular stretch.
    const angles = points.map(([x, y]) => clockwiseDeg(centre, x, y));
    for (const box of figures)
      for (const [x, y] of box.corners) {
        const r = Math.hypot(x - centre[0], y - centre[1]);
        expect(r, box.text).toBeGreaterThanOrEqual(inner - 1e-6);
        expect(r, box.text).toBeLessThanOrEqual(outer + 1e-6);
        const a = clockwiseDeg(centre, x, y);
        expect(angles.some((p) => Math.abs(((p - a + 540) % 360) - 180) < 0.5) || (a >= Math.min(...angles) && a <= Math.max(...angles)), box.text).toBe(true);
      }
  });

  it.each(FULL_SIZE)('%s: 1° and ½° graduations only between the first and last figure', (_, input) => {
    const { svg } = sheet({ ...input, ...ADVANCE });
    const btdc = byRole(svg, 'text', 'strobe-numeral').map(btdcOf);
    const [lo, hi] = [Math.min(...btdc), Math.max(...btdc)];
    const fine = svg.all('line').filter((el) => ['1', '0.5'].includes(el.getAttribute('data-level') ?? ''));
    expect(fine.length).toBeGreaterThan(0);
    for (const tick of fine) {
      expect(btdcOf(tick)).toBeGreaterThanOrEqual(lo);
      expect(btdcOf(tick)).toBeLessThanOrEqual(hi);
    }
    // The same sheet without the option keeps them all round.
    const plain = sheet(input).svg.all('line').filter((el) => el.getAttribute('data-level') === '1');
    expect(plain.length).toBeGreaterThan(fine.length);
  });

  it('a piece too small for 5 mm figures says so in its notes, and still draws what fits', () => {
    const { drawing, svg } = sheet({ kind: 'strip', diameterMm: 240, stripWidthMm: 12, ...ADVANCE });
    expect(drawing.warnings.join('\n')).toMatch(/Strobe-readable figures drawn \d\.\d mm high every \d+° over .*below the 5 mm asked for: the strip is only 12 mm wide/);
    const figures = byRole(svg, 'text', 'strobe-numeral');
    expect(figures.length).toBeGreaterThan(0);
    for (const el of figures) expect(figureInkMm(svg, el)).toBeLessThan(MIN_FIGURE_MM);
  });

  it('a window strip away from the advance range draws no figures, keeps its fine graduations and says why', () => {
    // Window 30–150° ATDC (crank 30 to 150): nowhere near 16–22° BTDC.
    const window = { kind: 'strip', diameterMm: 240, stripWidthMm: 25, windowCrankDeg: [30, 150] as [number, number] } as const;
    const { drawing, svg } = sheet({ ...window, ...ADVANCE });
    expect(byRole(svg, 'text', 'strobe-numeral')).toHaveLength(0);
    expect(drawing.warnings.join('\n')).toMatch(/Strobe-readable figures not drawn: \d+–\d+° BTDC lies outside the window/);
    const fineTicks = (s: Svg) => s.all('line').filter((el) => el.getAttribute('data-level') === '1').length;
    expect(fineTicks(svg)).toBeGreaterThan(0);
    expect(fineTicks(svg)).toBe(fineTicks(sheet({ ...window, ...ADVANCE, strobeReadable: false }).svg));
  });

  it.each([
    ...[20, 40, 60, 90, 150, 220, 400].map((d) => ['wheel', { kind: 'wheel', diameterMm: d }] as const),
    ...[[60, 70], [110, 130], [130, 160], [300, 340]].map(([i, o]) => ['ring', { kind: 'ring', innerDiameterMm: i!, outerDiameterMm: o! }] as const),
    ...[6, 10, 16, 24, 40].map((w) => ['strip', { kind: 'strip', diameterMm: 120, stripWidthMm: w }] as const),
  ])('%s %o: figures 5 mm tall, or a note saying why not (never smaller in silence)', (_, input) => {
    const { drawing, svg } = sheet({ ...input, ...ADVANCE });
    const figures = byRole(svg, 'text', 'strobe-numeral');
    const small = figures.some((el) => figureInkMm(svg, el) < MIN_FIGURE_MM - 1e-9);
    if (small || figures.length === 0) expect(drawing.warnings.join('\n')).toMatch(/Strobe-readable figures (drawn|not drawn)/);
    // Every 10° is no better than the scale's own numbering: that is said too.
    const steps = new Set(figures.map(btdcOf).sort((a, b) => a - b).flatMap((v, i, all) => (i ? [v - all[i - 1]!] : [])));
    if (steps.has(10)) expect(drawing.warnings.join('\n')).toMatch(/every 10°|every 10° .*not every 5°/);
  });
});

describe('strobe-readable figures, measured on the PDF', () => {
  it.each(FULL_SIZE.filter(([, input]) => input.kind !== 'wheel' || input.diameterMm < 300))(
    '%s: pdfjs reads a font size whose digits stand at least 5 mm',
    async (_, input) => {
      const { drawing, svg } = sheet({ ...input, ...ADVANCE });
      const labels = new Set(byRole(svg, 'text', 'strobe-numeral').map((el) => el.textContent));
      const items = await readPdfTextItems(await renderSheetPdf(drawing));
      const big = items.filter((item) => item.sizeMm * DIGIT_HEIGHT_EM >= MIN_FIGURE_MM);
      expect(new Set(big.map((item) => item.text))).toEqual(labels);
    },
    60_000,
  );

  it('pdftotext -bbox: the strip’s upright figures have word boxes of a font whose digits stand at least 5 mm', async () => {
    const { drawing, svg } = sheet({ kind: 'strip', diameterMm: 240, stripWidthMm: 25, ...ADVANCE });
    const labels = new Set(byRole(svg, 'text', 'strobe-numeral').map((el) => el.textContent));
    const dir = mkdtempSync(path.join(tmpdir(), 'rimscale-strobe-'));
    try {
      writeFileSync(path.join(dir, 'sheet.pdf'), await renderSheetPdf(drawing));
      const html = execFileSync('pdftotext', ['-bbox', 'sheet.pdf', '-'], { cwd: dir, encoding: 'utf8' });
      const words = [...html.matchAll(/<word xMin="[\d.]+" yMin="([\d.]+)" xMax="[\d.]+" yMax="([\d.]+)">([^<]*)<\/word>/g)].map((m) => ({
        text: m[3]!,
        // Box height / (ascent − descent) is the font size; × the digit's height is the figure's ink.
        inkMm: ((Number(m[2]) - Number(m[1])) / WORD_BOX_EM) * DIGIT_HEIGHT_EM * MM_PER_PT,
      }));
      const tall = words.filter((w) => w.inkMm >= MIN_FIGURE_MM);
      expect(new Set(tall.map((w) => w.text))).toEqual(labels);
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  }, 60_000);
});

describe('strobe.ts', () => {
  it('covers the advance band, else the marks, else 10–30° BTDC, widened to at least 10°', () => {
    expect(strobeRangeBtdcDeg({ advanceBandDeg: [22, 10], advanceMarksDeg: [40] })).toEqual([10, 22]);
    expect(strobeRangeBtdcDeg({ advanceBandDeg: [16, 20], advanceMarksDeg: [] })).toEqual([13, 23]);
    expect(strobeRangeBtdcDeg({ advanceMarksDeg: [12, 30], targetAdvanceDeg: 34 })).toEqual([12, 34]);
    expect(strobeRangeBtdcDeg({ advanceMarksDeg: [], targetAdvanceDeg: 58 })).toEqual([50, 60]);
    expect(strobeRangeBtdcDeg({ advanceMarksDeg: [] })).toEqual([10, 30]);
  });

  it('puts figures at every step, the ends rounded outwards, numbered like the scale', () => {
    expect(strobeNumerals([13, 23], 5, 'split').map((f) => f.label)).toEqual(['10', '15', '20', '25']);
    expect(strobeNumerals([13, 23], 2, 'split').map((f) => f.advanceDeg)).toEqual([12, 14, 16, 18, 20, 22, 24]);
    // Full numbering counts crank degrees: 10° BTDC is 350 (DEVELOPERS.md, "Angles").
    expect(strobeNumerals([0, 10], 5, 'full').map((f) => f.label)).toEqual(['0', '355', '350']);
  });

  it('takes 2° before 5° before 10°, along before across, and says when it settles for less', () => {
    const roomy = chooseStrobeFit([10, 30], 'split', () => ({ sizeMm: 99, limit: '' }));
    expect(roomy.fit).toMatchObject({ stepDeg: 2, orientation: 'along', sizeMm: 7 });
    expect(roomy.warnings).toEqual([]);
    const acrossAt5 = chooseStrobeFit([10, 30], 'split', (step, orientation) => ({ sizeMm: step === 5 && orientation === 'across' ? 7 : 4, limit: 'tight' }));
    expect(acrossAt5.fit).toMatchObject({ stepDeg: 5, orientation: 'across' });
    const cramped = chooseStrobeFit([10, 30], 'split', (step) => ({ sizeMm: step, limit: 'the ring is narrow' }));
    expect(cramped.fit).toMatchObject({ stepDeg: 10, sizeMm: 7 });
    expect(cramped.warnings[0]).toMatch(/every 10° over 10–30° BTDC, not every 5°: the ring is narrow/);
    const tiny = chooseStrobeFit([10, 30], 'split', () => ({ sizeMm: 1, limit: 'the wheel is 20 mm across' }));
    expect(tiny.fit).toBeUndefined();
    expect(tiny.warnings[0]).toMatch(/not drawn over 10–30° BTDC: the wheel is 20 mm across/);
  });
});
