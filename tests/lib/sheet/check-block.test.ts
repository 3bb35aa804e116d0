// Source under test: lib/sheet/check-block.ts and lib/sheet/printer-correction.ts via build-drawing
// and render-svg. References: ISO/IEC 7810 ID-1 card 85.60 × 53.98 mm; the international inch is
// exactly 25.4 mm (1959 agreement), so 4 in = 101.6 mm.
import { describe, expect, it } from 'vitest';
import { buildDrawing } from '@/lib/sheet/build-drawing';
import { renderSvg } from '@/lib/sheet/render-svg';
import { FIXED_DATE, lines, n, parseSvg, req } from './svg-measure';

function bars(input: Parameters<typeof req>[0]) {
  const drawing = buildDrawing(req(input), { date: FIXED_DATE });
  const svg = parseSvg(renderSvg(drawing));
  const found = lines(svg, (el) => el.getAttribute('data-role') === 'check-bar').map((l) => ({
    checkMm: n(l.el, 'data-check-mm'),
    axis: l.el.getAttribute('data-axis'),
    lengthMm: Math.hypot(l.x2 - l.x1, l.y2 - l.y1),
    horizontal: Math.abs(l.y2 - l.y1) < 1e-9,
    vertical: Math.abs(l.x2 - l.x1) < 1e-9,
  }));
  const card = svg.all('rect').find((r) => r.getAttribute('data-role') === 'card')!;
  return { drawing, svg, found, card };
}

describe('scale check block', () => {
  it.each(['wheel', 'ring', 'strip', 'scribe', 'check'] as const)('is on every sheet (%s): 100 mm and 4 in bars both ways and the ID-1 card', (kind) => {
    const { found, card } = bars({ kind, diameterMm: 100, innerDiameterMm: 100, outerDiameterMm: 130 });
    expect(found).toHaveLength(4);
    for (const [checkMm, axis] of [
      [100, 'x'],
      [101.6, 'x'],
      [100, 'y'],
      [101.6, 'y'],
    ] as const) {
      const bar = found.find((b) => b.checkMm === checkMm && b.axis === axis)!;
      expect(bar.lengthMm).toBeCloseTo(checkMm, 6);
      expect(axis === 'x' ? bar.horizontal : bar.vertical).toBe(true);
    }
    expect(n(card, 'width')).toBeCloseTo(85.6, 6);
    expect(n(card, 'height')).toBeCloseTo(53.98, 6);
    expect(n(card, 'data-check-mm')).toBe(85.6);
  });

  it('bars carry 1 mm subdivisions and end ticks', () => {
    const { svg } = bars({ kind: 'check' });
    // 99 inner mm ticks on a 100 mm bar and 101 on a 101.6 mm bar, in each axis.
    expect(lines(svg, (el) => el.getAttribute('data-role') === 'check-mm')).toHaveLength(2 * (99 + 101));
    expect(lines(svg, (el) => el.getAttribute('data-role') === 'check-end')).toHaveLength(8);
  });
});

describe('printer correction', () => {
  it('printerScaleX 0.98: the horizontal 100 mm bar is drawn 100/0.98 = 102.04 mm, the vertical one 100 mm', () => {
    const { found } = bars({ kind: 'check', printerScaleX: 0.98 });
    expect(found.find((b) => b.checkMm === 100 && b.axis === 'x')!.lengthMm).toBeCloseTo(102.0408, 3);
    expect(found.find((b) => b.checkMm === 100 && b.axis === 'y')!.lengthMm).toBeCloseTo(100, 6);
    expect(found.find((b) => b.checkMm === 101.6 && b.axis === 'x')!.lengthMm).toBeCloseTo(101.6 / 0.98, 3);
  });

  it('makes circles ellipses (1/scale per axis) and keeps text sizes', () => {
    const plain = buildDrawing(req({ kind: 'wheel', diameterMm: 100 }), { date: FIXED_DATE });
    const corrected = buildDrawing(req({ kind: 'wheel', diameterMm: 100, printerScaleX: 1.02, printerScaleY: 0.97 }), { date: FIXED_DATE });
    const svg = parseSvg(renderSvg(corrected));
    const cut = svg.all('ellipse').find((e) => e.getAttribute('data-role') === 'cut-line')!;
    expect(n(cut, 'rx')).toBeCloseTo(50 / 1.02, 4);
    expect(n(cut, 'ry')).toBeCloseTo(50 / 0.97, 4);
    const sizes = (d: typeof plain) => d.shapes.flatMap((s) => (s.type === 'text' && s.data?.role === 'numeral' ? [s.sizeMm] : []));
    expect(sizes(plain)).toHaveLength(36);
    expect(sizes(corrected)).toEqual(sizes(plain));
    // The title block names the correction.
    const words = svg.all('text').map((t) => t.textContent).join(' ');
    expect(words).toContain('printer scale x 1.020 · y 0.970');
  });
});

describe('correctForPrinter (lib/sheet/printer-correction.ts)', () => {
  it('pre-scales coordinates by 1/scale per axis and leaves text sizes alone', async () => {
    const { correctForPrinter } = await import('@/lib/sheet/printer-correction');
    const [bar, label] = correctForPrinter(
      [
        { type: 'line', x1Mm: 10, y1Mm: 20, x2Mm: 110, y2Mm: 20, strokeMm: 0.2 },
        { type: 'text', xMm: 49, yMm: 97, text: '100 mm', sizeMm: 2, anchor: 'start', rotateDeg: 0, weight: 'normal', font: 'ui' },
      ],
      { printerScaleX: 0.98, printerScaleY: 0.97 },
    );
    if (bar?.type !== 'line' || label?.type !== 'text') throw new Error('shape types changed');
    expect(bar.x2Mm - bar.x1Mm).toBeCloseTo(102.0408, 4); // 100 / 0.98
    expect(bar.y1Mm).toBeCloseTo(20 / 0.97, 9);
    expect(label.xMm).toBeCloseTo(50, 9); // 49 / 0.98
    expect(label.yMm).toBeCloseTo(100, 9); // 97 / 0.97
    expect(label.sizeMm).toBe(2);
  });
});
