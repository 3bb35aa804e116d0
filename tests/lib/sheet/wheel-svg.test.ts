// Source under test: lib/sheet/build-drawing.ts, lib/sheet/wheel-layout.ts, lib/sheet/polar-scale.ts,
// lib/sheet/render-svg.ts. Geometry is measured on the SVG output, parsed with @xmldom/xmldom.
import { describe, expect, it } from 'vitest';
import { buildDrawing } from '@/lib/sheet/build-drawing';
import { renderSvg } from '@/lib/sheet/render-svg';
import { centreOf, clockwiseDeg, FIXED_DATE, isTick, lines, n, parseSvg, req } from './svg-measure';

function wheelSvg(input: Parameters<typeof req>[0]) {
  const drawing = buildDrawing(req(input), { date: FIXED_DATE });
  return { drawing, svg: parseSvg(renderSvg(drawing)) };
}

/** Where a crank angle sits (DEVELOPERS.md, "Rotation and carrier"), clockwise as seen from TDC at the top (written out independently). */
function expectedClockwiseDeg(crankDeg: number, rotation: 'cw' | 'ccw', carrier: 'rotating' | 'stationary'): number {
  // Rotating scale: BTDC (crank just below 360) lies from TDC in the direction of rotation,
  // so increasing crank runs against rotation; stationary: with it. cw rotation = clockwise on the page.
  const withRotation = carrier === 'rotating' ? -crankDeg : crankDeg;
  const clockwise = rotation === 'cw' ? withRotation : -withRotation;
  return ((clockwise % 360) + 360) % 360;
}

function angularGapDeg(a: number, b: number): number {
  const d = Math.abs(a - b) % 360;
  return Math.min(d, 360 - d);
}

describe('degree wheel SVG, measured', () => {
  it('has its root size in mm and a viewBox in mm (one user unit = 1 mm, CSS/SVG units)', () => {
    const { drawing, svg } = wheelSvg({ kind: 'wheel', diameterMm: 150 });
    // ISO 216 A4 portrait is 210 × 297 mm; a one-page sheet is the page.
    expect(svg.root.getAttribute('width')).toBe('210mm');
    expect(svg.root.getAttribute('height')).toBe('297mm');
    expect(svg.root.getAttribute('viewBox')).toBe('0 0 210 297');
    expect(drawing.pages).toHaveLength(1);
  });

  it('puts every one of the 720 ticks of a 300 mm wheel on its analytic ray and radius (≤ 0.001 mm)', () => {
    const D = 300;
    const { svg } = wheelSvg({ kind: 'wheel', diameterMm: D, paper: 'A3' });
    const centre = centreOf(svg);
    const ticks = lines(svg, isTick);
    // 0.5° pitch at 300 mm: π·300·0.5/360 = 1.309 mm ≥ 0.6 mm, so all four levels are drawn.
    expect(ticks).toHaveLength(720);
    const byLevel = (level: string) => ticks.filter((t) => t.el.getAttribute('data-level') === level).length;
    expect([byLevel('10'), byLevel('5'), byLevel('1'), byLevel('0.5')]).toEqual([36, 36, 288, 360]);
    const seen = new Set<number>();
    for (const tick of ticks) {
      const crankDeg = n(tick.el, 'data-crank-deg');
      seen.add(crankDeg);
      const theta = (expectedClockwiseDeg(crankDeg, 'cw', 'rotating') * Math.PI) / 180;
      const ux = Math.sin(theta);
      const uy = -Math.cos(theta);
      for (const [x, y] of [
        [tick.x1, tick.y1],
        [tick.x2, tick.y2],
      ] as const) {
        const dx = x - centre[0];
        const dy = y - centre[1];
        expect(Math.abs(dx * uy - dy * ux)).toBeLessThanOrEqual(0.001); // off the ray
        expect(dx * ux + dy * uy).toBeGreaterThan(0); // on the correct side of the centre
      }
      // The reading end of every tick sits on the cut circle, radius D/2.
      expect(Math.abs(Math.hypot(tick.x1 - centre[0], tick.y1 - centre[1]) - D / 2)).toBeLessThanOrEqual(0.001);
      // …and runs inwards.
      expect(Math.hypot(tick.x2 - centre[0], tick.y2 - centre[1])).toBeLessThan(D / 2);
    }
    expect(seen.size).toBe(720);
  });

  it('draws longer ticks for coarser levels (10° > 5° > 1° > 0.5°)', () => {
    const { svg } = wheelSvg({ kind: 'wheel', diameterMm: 300, paper: 'A3' });
    const length = (level: string) => {
      const t = lines(svg, (el) => el.getAttribute('data-level') === level)[0]!;
      return Math.hypot(t.x2 - t.x1, t.y2 - t.y1);
    };
    expect(length('10')).toBeGreaterThan(length('5'));
    expect(length('5')).toBeGreaterThan(length('1'));
    expect(length('1')).toBeGreaterThan(length('0.5'));
  });

  it('the cut circle has the given diameter and sits on data-centre-mm', () => {
    const { svg } = wheelSvg({ kind: 'wheel', diameterMm: 123.4, hubHoleMm: 20 });
    const centre = centreOf(svg);
    const cut = svg.all('circle').find((c) => c.getAttribute('data-role') === 'cut-line')!;
    expect(n(cut, 'r')).toBeCloseTo(61.7, 4);
    expect(n(cut, 'cx')).toBeCloseTo(centre[0], 4);
    expect(n(cut, 'cy')).toBeCloseTo(centre[1], 4);
    const hub = svg.all('circle').find((c) => c.getAttribute('data-role') === 'hub-hole')!;
    expect(n(hub, 'r')).toBeCloseTo(10, 4);
    const ring = svg.all('circle').find((c) => c.getAttribute('data-role') === 'centre-ring')!;
    expect(2 * n(ring, 'r')).toBeCloseTo(1, 4); // the 1 mm centring ring
  });

  describe('the 18° BTDC mark: all four rotation × carrier combinations (DEVELOPERS.md, "Rotation and carrier")', () => {
    const cases = [
      ['cw', 'rotating', 18],
      ['cw', 'stationary', 342],
      ['ccw', 'rotating', 342],
      ['ccw', 'stationary', 18],
    ] as const;
    it.each(cases)('rotation %s, carrier %s: clockwise angle from TDC as seen is %s°', (rotation, carrier, expectedDeg) => {
      const { svg } = wheelSvg({ kind: 'wheel', diameterMm: 150, rotation, carrier, advanceMarksDeg: [18] });
      const centre = centreOf(svg);
      const mark = lines(svg, (el) => el.getAttribute('data-advance-deg') === '18')[0]!;
      expect(mark.el.getAttribute('data-crank-deg')).toBe('342'); // 18° BTDC = 360 − 18
      expect(angularGapDeg(clockwiseDeg(centre, mark.x1, mark.y1), expectedDeg)).toBeLessThan(1e-4);
      // Its label says so.
      const label = svg.all('text').find((t) => t.getAttribute('data-role') === 'advance-label')!;
      expect(label.textContent).toBe('18° BTDC');
      // TDC (crank 0) is straight up in every case.
      const tdc = lines(svg, (el) => el.getAttribute('data-crank-deg') === '0' && el.hasAttribute('data-level'))[0]!;
      expect(angularGapDeg(clockwiseDeg(centre, tdc.x1, tdc.y1), 0)).toBeLessThan(1e-4);
    });

    it('rotating cw: 90° ATDC (crank 90) lies counter-clockwise, i.e. on the left of the page', () => {
      const { svg } = wheelSvg({ kind: 'wheel', diameterMm: 150 });
      const centre = centreOf(svg);
      const t = lines(svg, (el) => el.getAttribute('data-crank-deg') === '90' && el.hasAttribute('data-level'))[0]!;
      expect(t.x1).toBeLessThan(centre[0] - 70);
      expect(Math.abs(t.y1 - centre[1])).toBeLessThan(1e-3);
    });
  });

  it('advance marks are heavy (0.3 mm) and longer than the 10° ticks', () => {
    const { svg } = wheelSvg({ kind: 'wheel', diameterMm: 150, advanceMarksDeg: [16, 17, 18, 19, 20] });
    const marks = lines(svg, (el) => el.hasAttribute('data-advance-deg'));
    expect(marks.map((m) => m.el.getAttribute('data-advance-deg')).sort()).toEqual(['16', '17', '18', '19', '20']);
    const long = lines(svg, (el) => el.getAttribute('data-level') === '10')[0]!;
    for (const m of marks) {
      expect(n(m.el, 'stroke-width')).toBe(0.3);
      expect(Math.hypot(m.x2 - m.x1, m.y2 - m.y1)).toBeGreaterThan(Math.hypot(long.x2 - long.x1, long.y2 - long.y1));
    }
  });

  it('numbers split scales 0→180 both ways and full scales 0–350 in crank order', () => {
    const numerals = (numbering: 'split' | 'full') =>
      wheelSvg({ kind: 'wheel', diameterMm: 200, numbering, paper: 'A3' })
        .svg.all('text')
        .filter((t) => t.getAttribute('data-role') === 'numeral')
        .map((t) => [n(t, 'data-crank-deg'), t.textContent] as const);
    const split = new Map(numerals('split'));
    expect(split.get(20)).toBe('20');
    expect(split.get(340)).toBe('20'); // 20° BTDC
    expect(split.get(180)).toBe('180');
    const full = new Map(numerals('full'));
    expect(full.get(340)).toBe('340');
    expect(full.size).toBe(36);
  });
});

describe('flange ring SVG, measured', () => {
  it.each([
    ['cw', 342],
    ['ccw', 18],
  ] as const)('stationary ring, rotation %s: 18° BTDC lies %s° clockwise from TDC (against the rotation)', (rotation, expectedDeg) => {
    const { svg } = wheelSvg({ kind: 'ring', innerDiameterMm: 112, outerDiameterMm: 150, carrier: 'stationary', rotation, advanceMarksDeg: [18] });
    const mark = lines(svg, (el) => el.getAttribute('data-advance-deg') === '18')[0]!;
    expect(angularGapDeg(clockwiseDeg(centreOf(svg), mark.x1, mark.y1), expectedDeg)).toBeLessThan(1e-4);
  });

  it('ticks start on the inner circle and run outwards', () => {
    const { svg } = wheelSvg({ kind: 'ring', innerDiameterMm: 112, outerDiameterMm: 150, carrier: 'stationary' });
    const centre = centreOf(svg);
    const ticks = lines(svg, isTick);
    // Pitch at the inner diameter: 1° → π·112/360 = 0.977 mm ≥ 0.6; 0.5° → 0.489 mm < 0.6: 360 ticks.
    expect(ticks).toHaveLength(360);
    for (const t of ticks) {
      expect(Math.abs(Math.hypot(t.x1 - centre[0], t.y1 - centre[1]) - 56)).toBeLessThanOrEqual(0.001);
      expect(Math.hypot(t.x2 - centre[0], t.y2 - centre[1])).toBeGreaterThan(56);
      expect(Math.hypot(t.x2 - centre[0], t.y2 - centre[1])).toBeLessThan(75);
    }
    const cuts = svg.all('circle').filter((c) => c.getAttribute('data-role')?.startsWith('cut-line'));
    expect(cuts.map((c) => n(c, 'r')).sort((a, b) => a - b)).toEqual([56, 75]);
  });
});
