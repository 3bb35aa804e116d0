// Source under test: lib/sheet/render-svg.ts (and the builder's non-finite guard in
// lib/sheet/assert-finite.ts). Output read back with @xmldom/xmldom.
import { describe, expect, it } from 'vitest';
import { assertFiniteDrawing } from '@/lib/sheet/assert-finite';
import { buildDrawing } from '@/lib/sheet/build-drawing';
import type { Drawing } from '@/lib/sheet/drawing';
import { escapeXml, num, renderSvg } from '@/lib/sheet/render-svg';
import { FIXED_DATE, parseSvg, req } from './svg-measure';

const tiny = (shapes: Drawing['shapes']): Drawing => ({
  sizeMm: { widthMm: 50, heightMm: 40 },
  shapes,
  pages: [{ sizeMm: { widthMm: 50, heightMm: 40 }, viewportMm: { xMm: 0, yMm: 0, widthMm: 50, heightMm: 40 }, originMm: [0, 0], pageShapes: [] }],
  warnings: [],
  title: 't',
});

describe('renderSvg', () => {
  it('writes a title with markup as inert text (no <script> element)', () => {
    const title = '<script>alert(1)</script> & "quotes"';
    const svgText = renderSvg(buildDrawing(req({ kind: 'wheel', diameterMm: 100, title }), { date: FIXED_DATE }));
    const svg = parseSvg(svgText);
    expect(svg.all('script')).toHaveLength(0);
    expect(svgText).not.toContain('<script>');
    const titleText = svg.all('text').filter((t) => t.getAttribute('data-role') === 'title').map((t) => t.textContent);
    // The title may wrap (and a long word be cut) over lines: compare without the breaks.
    expect(titleText.join('').replace(/\s/g, '')).toBe(title.replace(/\s/g, ''));
    expect(svg.all('title')[0]!.textContent).toBe(title);
  });

  it('escapes the five XML specials and drops control characters', () => {
    expect(escapeXml(`<a href="x">'&'</a>\u0001`)).toBe('&lt;a href=&quot;x&quot;&gt;&#39;&amp;&#39;&lt;/a&gt;');
  });

  it('writes numbers with at most 4 decimals, no exponent, and refuses NaN or Infinity', () => {
    expect(num(1 / 3)).toBe('0.3333');
    expect(num(1e-9)).toBe('0');
    expect(num(-0)).toBe('0');
    expect(num(123456.78915)).toBe('123456.7892');
    expect(() => num(Number.NaN)).toThrow(/non-finite/);
    expect(() => num(Infinity)).toThrow(/non-finite/);
  });

  it('writes every number as String() writes it rounded to 4 decimals, signs and whole parts included', () => {
    // ECMAScript Number::toString (ECMA-262 §6.1.6.1.20) is the independent writer here.
    const values = [-0.0005, -0.5, -1, -12.04, 1023.9999, 1024.5, -1023.25, -4096.0001, 0.1, 7, 63.8483, -63.8483];
    for (let i = 0; i < 2000; i += 1) values.push((i * 7919) % 20000 / 9.7 - 1000);
    for (const value of values) expect(num(value), String(value)).toBe(String(Math.round(value * 1e4) / 1e4));
  });

  it('the builder guard names the bad field instead of emitting NaN', () => {
    const bad = tiny([{ type: 'line', x1Mm: 0, y1Mm: 0, x2Mm: Number.NaN, y2Mm: 1, strokeMm: 0.2 }]);
    expect(() => assertFiniteDrawing(bad)).toThrow('shapes[0] (line).x2Mm');
  });

  it('the builder guard names a bad path point, stroke or data value, and passes finite shapes', () => {
    const point = tiny([{ type: 'path', pointsMm: [[0, 0], [1, Infinity]], closed: false, fill: 'none', strokeMm: 0.2 }]);
    expect(() => assertFiniteDrawing(point)).toThrow('shapes[0] (path).pointsMm[1][1]');
    const stroke = tiny([{ type: 'rect', xMm: 0, yMm: 0, widthMm: 1, heightMm: 1, strokeMm: Number.NaN, fill: 'none' }]);
    expect(() => assertFiniteDrawing(stroke)).toThrow('shapes[0] (rect).strokeMm');
    const data = tiny([{ type: 'line', x1Mm: 0, y1Mm: 0, x2Mm: 1, y2Mm: 1, strokeMm: 0.2, data: { crankDeg: Number.NaN } }]);
    expect(() => assertFiniteDrawing(data)).toThrow('shapes[0] (line).data.crankDeg');
    const fine = tiny([{ type: 'text', xMm: 1, yMm: 2, text: '10', sizeMm: 3, anchor: 'middle', rotateDeg: 0, weight: 'normal', font: 'ui' }]);
    expect(assertFiniteDrawing(fine)).toBe(fine);
  });

  it('writes hatch fills through an SVG pattern and grey15 as #d9d9d9, strokes in mm user units', () => {
    const svg = parseSvg(
      renderSvg(
        tiny([
          { type: 'rect', xMm: 1, yMm: 1, widthMm: 10, heightMm: 5, fill: 'hatch', strokeMm: 0.12 },
          { type: 'rect', xMm: 1, yMm: 10, widthMm: 10, heightMm: 5, fill: 'grey15', strokeMm: 0.12 },
          { type: 'text', xMm: 2, yMm: 30, text: '18° BTDC', sizeMm: 2.2, anchor: 'start', rotateDeg: 0, weight: 'bold', font: 'ui' },
        ]),
      ),
    );
    const [hatch, grey] = svg.all('rect').filter((r) => r.getAttribute('data-role') !== 'paper');
    const patternId = svg.all('pattern')[0]!.getAttribute('id');
    expect(hatch!.getAttribute('fill')).toBe(`url(#${patternId})`);
    expect(grey!.getAttribute('fill')).toBe('#d9d9d9');
    expect(hatch!.getAttribute('stroke-width')).toBe('0.12');
    const label = svg.all('text')[0]!;
    expect(label.getAttribute('font-family')).toMatch(/^'Rimscale Sheet'.*sans-serif$/);
    expect(label.getAttribute('font-size')).toBe('2.2');
    expect(svg.root.getAttribute('width')).toBe('50mm');
    expect(svg.root.getAttribute('viewBox')).toBe('0 0 50 40');
  });

  it('keeps every stroke of a real sheet within 0.12–0.3 mm and black', () => {
    const svg = parseSvg(renderSvg(buildDrawing(req({ kind: 'wheel', diameterMm: 150, advanceMarksDeg: [18], advanceBandDeg: [16, 20] }), { date: FIXED_DATE })));
    for (const tag of ['line', 'circle', 'ellipse', 'rect', 'path']) {
      for (const el of svg.all(tag)) {
        const width = el.getAttribute('stroke-width');
        if (!width || el.parentNode?.nodeName === 'pattern') continue;
        expect(Number(width)).toBeGreaterThanOrEqual(0.12);
        expect(Number(width)).toBeLessThanOrEqual(0.3);
        expect(el.getAttribute('stroke')).toBe('#000');
      }
    }
  });
});
