// Source under test: lib/sheet/scale-marks.ts, lib/sheet/polar-band.ts (d3-shape arc() sampled by
// lib/sheet/arc-context.ts) and lib/sheet/polar-scale.ts: advance bands and port events, measured on the SVG.
import { describe, expect, it } from 'vitest';
import { buildDrawing } from '@/lib/sheet/build-drawing';
import { renderSvg } from '@/lib/sheet/render-svg';
import { centreOf, clockwiseDeg, FIXED_DATE, lines, n, parseSvg, req } from './svg-measure';

function points(d: string): Array<[number, number]> {
  return [...d.matchAll(/[ML](-?[\d.]+) (-?[\d.]+)/g)].map((m) => [Number(m[1]), Number(m[2])]);
}

describe('advance band', () => {
  it.each([
    ['cw', 'rotating', 16, 20],
    ['cw', 'stationary', 340, 344],
    ['ccw', 'rotating', 340, 344],
  ] as const)('on a %s %s wheel spans clockwise %s°–%s° from TDC as a closed hatched path', (rotation, carrier, fromCw, toCw) => {
    const svg = parseSvg(renderSvg(buildDrawing(req({ kind: 'wheel', diameterMm: 150, rotation, carrier, advanceBandDeg: [16, 20] }), { date: FIXED_DATE })));
    const centre = centreOf(svg);
    const band = svg.all('path').find((p) => p.getAttribute('data-role') === 'advance-band')!;
    expect(band.getAttribute('fill')).toMatch(/^url\(#/);
    const d = band.getAttribute('d')!;
    expect(d.endsWith('Z')).toBe(true);
    const angles = points(d).map(([x, y]) => clockwiseDeg(centre, x, y));
    expect(Math.min(...angles)).toBeCloseTo(fromCw, 3);
    expect(Math.max(...angles)).toBeCloseTo(toCw, 3);
    // An annulus: two radii, all points on one or the other (sampled arcs, no chord shortcut at the vertices).
    const radii = [...new Set(points(d).map(([x, y]) => Math.hypot(x - centre[0], y - centre[1]).toFixed(2)))];
    expect(radii).toHaveLength(2);
  });

  it('is a grey rectangle on a strip, from 16° to 20° BTDC', () => {
    const svg = parseSvg(renderSvg(buildDrawing(req({ kind: 'strip', diameterMm: 100, advanceBandDeg: [20, 16], paper: 'A3', orientation: 'landscape' }), { date: FIXED_DATE })));
    const band = svg.all('rect').find((r) => r.getAttribute('data-role') === 'advance-band')!;
    expect(band.getAttribute('fill')).toBe('#d9d9d9');
    expect(n(band, 'width')).toBeCloseTo((Math.PI * 100.1 * 4) / 360, 3);
    const at = (crank: string) => lines(svg, (el) => el.hasAttribute('data-level') && el.getAttribute('data-crank-deg') === crank)[0]!.x1;
    expect(Math.min(at('344'), at('340'))).toBeCloseTo(n(band, 'x'), 3);
  });
});

describe('advance mark labels', () => {
  it('label each of 16–20° BTDC on a 150 mm wheel, fanned out in mark order, each joined to its own mark by a leader', () => {
    const svg = parseSvg(renderSvg(buildDrawing(req({ kind: 'wheel', diameterMm: 150, advanceMarksDeg: [16, 17, 18, 19, 20] }), { date: FIXED_DATE })));
    const centre = centreOf(svg);
    const labels = svg.all('text').filter((t) => t.getAttribute('data-role') === 'advance-label');
    expect(labels.map((t) => t.textContent).sort()).toEqual(['16° BTDC', '17° BTDC', '18° BTDC', '19° BTDC', '20° BTDC']);
    const marks = lines(svg, (el) => el.getAttribute('data-role') === 'advance');
    const leaders = lines(svg, (el) => el.getAttribute('data-role') === 'label-leader');
    expect(leaders).toHaveLength(5);
    // Each leader starts at the inner end of one mark; its far end says where that mark's label went.
    const fanned = marks
      .map((mark) => {
        const leader = leaders.find((l) => Math.hypot(l.x1 - mark.x2, l.y1 - mark.y2) < 1e-3)!;
        expect(leader).toBeDefined();
        return { advance: n(mark.el, 'data-advance-deg'), leader, deg: clockwiseDeg(centre, leader.x2, leader.y2) };
      })
      .sort((a, b) => a.advance - b.advance);
    // Rotating cw: x° BTDC sits x° clockwise from TDC; the fanned labels keep that order, centred on 18°.
    for (let i = 1; i < fanned.length; i += 1) expect(fanned[i]!.deg).toBeGreaterThan(fanned[i - 1]!.deg);
    expect(fanned[2]!.deg).toBeCloseTo(18, 3);
    for (const { advance, leader } of fanned) {
      // The label of that mark sits on the leader's ray (its baseline 0.275 × size off it, to centre the ink).
      const label = labels.find((t) => n(t, 'data-advance-deg') === advance)!;
      const [ux, uy] = [leader.x2 - centre[0], leader.y2 - centre[1]];
      const offRay = Math.abs((n(label, 'x') - centre[0]) * uy - (n(label, 'y') - centre[1]) * ux) / Math.hypot(ux, uy);
      expect(offRay).toBeCloseTo(0.275 * n(label, 'font-size'), 3);
    }
  });
});

describe('port events', () => {
  const ports = [{ name: 'Exhaust', opensCrankDeg: 96, closesCrankDeg: 264 }];
  it('are marked and labelled on full-numbered wheels, at their crank angles', () => {
    const drawing = buildDrawing(req({ kind: 'wheel', diameterMm: 200, numbering: 'full', portEvents: ports, paper: 'A3' }), { date: FIXED_DATE });
    const svg = parseSvg(renderSvg(drawing));
    const centre = centreOf(svg);
    const marks = lines(svg, (el) => el.getAttribute('data-role') === 'port');
    expect(marks.map((m) => n(m.el, 'data-crank-deg')).sort((a, b) => a - b)).toEqual([96, 264]);
    // Rotating cw: crank 96 lies 96° counter-clockwise from TDC, i.e. 264° clockwise.
    const opens = marks.find((m) => n(m.el, 'data-crank-deg') === 96)!;
    expect(clockwiseDeg(centre, opens.x1, opens.y1)).toBeCloseTo(264, 4);
    const labels = svg.all('text').filter((t) => t.getAttribute('data-role') === 'port-label').map((t) => t.textContent);
    expect(labels.sort()).toEqual(['Exhaust closes 264°', 'Exhaust opens 96°']);
  });

  // Analytic angles from the direction rule (DEVELOPERS.md, "Rotation and carrier"; lib/sheet/scale-direction.ts is
  // what is under test, so the expectation is worked out here by hand): rotating cw, crank c lies
  // (360 − c)° clockwise from TDC as seen.
  it.each([
    ['cw', 'rotating', (c: number) => (360 - c) % 360],
    ['ccw', 'rotating', (c: number) => c % 360],
    ['cw', 'stationary', (c: number) => c % 360],
    ['ccw', 'stationary', (c: number) => (360 - c) % 360],
  ] as const)('are drawn on split wheels too (%s, %s), at their analytic angles ±0.01°, labelled ATDC / BTDC', (rotation, carrier, expectedCw) => {
    const drawing = buildDrawing(req({ kind: 'wheel', diameterMm: 200, portEvents: [{ name: 'EX', opensCrankDeg: 97.5, closesCrankDeg: 262.5 }], rotation, carrier, paper: 'A3' }), { date: FIXED_DATE });
    const svg = parseSvg(renderSvg(drawing));
    const centre = centreOf(svg);
    const marks = lines(svg, (el) => el.getAttribute('data-role') === 'port');
    expect(marks).toHaveLength(2);
    for (const mark of marks) {
      const crank = n(mark.el, 'data-crank-deg');
      const seen = clockwiseDeg(centre, mark.x1, mark.y1);
      expect(Math.abs(((seen - expectedCw(crank) + 540) % 360) - 180)).toBeLessThanOrEqual(0.01);
    }
    const labels = svg.all('text').filter((t) => t.getAttribute('data-role') === 'port-label').map((t) => t.textContent);
    expect(labels.sort()).toEqual(['EX closes 97.5° BTDC', 'EX opens 97.5° ATDC']);
    expect(drawing.warnings.some((w) => /port/i.test(w))).toBe(false);
  });

  it('are drawn on split strips at (seam − crank)·π(D + t)/360 along the arrow ±0.01°, labelled', () => {
    const drawing = buildDrawing(req({ kind: 'strip', diameterMm: 50, portEvents: [{ name: 'TR', opensCrankDeg: 118, closesCrankDeg: 242 }] }), { date: FIXED_DATE });
    const svg = parseSvg(renderSvg(drawing));
    const mmPerDeg = (Math.PI * 50.1) / 360;
    const seam = lines(svg, (el) => el.getAttribute('data-role') === 'seam')[0]!;
    const marks = lines(svg, (el) => el.getAttribute('data-role') === 'port');
    expect(marks.map((m) => n(m.el, 'data-crank-deg')).sort((a, b) => a - b)).toEqual([118, 242]);
    // Rotating strip, seam at BDC (180): crank c sits (180 − c) mod 360 degrees along the arrow.
    for (const mark of marks) expect(Math.abs((mark.x1 - seam.x1) / mmPerDeg - ((((180 - n(mark.el, 'data-crank-deg')) % 360) + 360) % 360))).toBeLessThanOrEqual(0.01);
    const labels = svg.all('text').filter((t) => t.getAttribute('data-role') === 'port-label').map((t) => t.textContent);
    expect(labels.sort()).toEqual(['TR closes 118° BTDC', 'TR opens 118° ATDC']);
  });

  it('outside a window strip are named in the warnings, not dropped silently', () => {
    const drawing = buildDrawing(req({ kind: 'strip', diameterMm: 150, windowCrankDeg: [320, 10], advanceMarksDeg: [18, 55], portEvents: ports }), { date: FIXED_DATE });
    const note = drawing.warnings.find((w) => w.startsWith('Not drawn, outside the window'));
    expect(note).toContain('advance mark 55° BTDC');
    expect(note).toContain('Exhaust opens 96° ATDC');
    expect(note).not.toContain('18°');
    // …and the same words are printed on the sheet itself.
    const svg = parseSvg(renderSvg(drawing));
    expect(svg.all('text').filter((t) => t.getAttribute('data-role') === 'layout-notes').map((t) => t.textContent).join(' ')).toContain('outside the window');
  });

  it('appear on full-numbered strips too', () => {
    const drawing = buildDrawing(req({ kind: 'strip', diameterMm: 50, numbering: 'full', portEvents: ports }), { date: FIXED_DATE });
    expect(drawing.shapes.filter((s) => s.data?.role === 'port')).toHaveLength(2);
  });
});

describe('numerals next to a mark', () => {
  it('are offset clear of the heavy line, not dropped: 100, 260 and 340 stay on a full wheel with ports at 98/262 and 18° BTDC', () => {
    const svg = parseSvg(renderSvg(buildDrawing(req({ kind: 'wheel', diameterMm: 150, numbering: 'full', advanceMarksDeg: [18], portEvents: [{ name: 'EX', opensCrankDeg: 98, closesCrankDeg: 262 }] }), { date: FIXED_DATE })));
    const numerals = svg.all('text').filter((t) => t.getAttribute('data-role') === 'numeral');
    expect(numerals.map((t) => t.textContent).sort((a, b) => Number(a) - Number(b))).toEqual(Array.from({ length: 36 }, (_, i) => String(i * 10)));
    const centre = centreOf(svg);
    const markDeg = lines(svg, (el) => ['port', 'advance'].includes(el.getAttribute('data-role') ?? '')).map((m) => clockwiseDeg(centre, m.x1, m.y1));
    // Each numeral's anchor keeps at least half its width (at its radius) from every mark: the line misses it.
    for (const numeral of numerals) {
      const x = n(numeral, 'x');
      const y = n(numeral, 'y');
      const r = Math.hypot(x - centre[0], y - centre[1]);
      const halfDeg = ((n(numeral, 'font-size') * 0.6 * (numeral.textContent ?? '').length) / 2 / r) * (180 / Math.PI);
      const at = clockwiseDeg(centre, x, y);
      for (const deg of markDeg) expect(Math.abs(((at - deg + 540) % 360) - 180)).toBeGreaterThan(halfDeg * 0.95);
    }
  });
});
