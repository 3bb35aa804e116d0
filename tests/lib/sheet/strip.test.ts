// Source under test: lib/sheet/strip-layout.ts (rim strips, segments, windows) through
// lib/sheet/build-drawing.ts and lib/sheet/render-svg.ts; measured on the SVG with @xmldom/xmldom.
import { describe, expect, it } from 'vitest';
import { buildDrawing } from '@/lib/sheet/build-drawing';
import { renderSvg } from '@/lib/sheet/render-svg';
import { planStrip, STRIP_OVERLAP_MM, stripRange, windowSpanDeg } from '@/lib/sheet/strip-layout';
import { FIXED_DATE, isTick, lines, n, parseSvg, req, type Line } from './svg-measure';
import { textBox } from './text-boxes';

function stripSvg(input: Omit<Parameters<typeof req>[0], 'kind'>) {
  const drawing = buildDrawing(req({ ...input, kind: 'strip' }), { date: FIXED_DATE });
  return { drawing, svg: parseSvg(renderSvg(drawing)) };
}

type Segment = { letter: string; startX: number; endX: number; endRole: string; ticks: Line[] };

/** Each segment's start edge, marked end (join line or final seam) and ticks, read from the SVG. */
function segments(svg: ReturnType<typeof parseSvg>): Segment[] {
  const all = lines(svg);
  const letters = [...new Set(all.map((l) => l.el.getAttribute('data-segment')).filter((s): s is string => !!s))].sort();
  const groups = letters.length ? letters : [''];
  return groups.map((letter) => {
    const mine = all.filter((l) => (l.el.getAttribute('data-segment') ?? '') === letter);
    const starts = mine.filter((l) => ['seam', 'segment-start', 'window-end'].includes(l.el.getAttribute('data-role') ?? ''));
    const startX = Math.min(...starts.map((l) => l.x1));
    const join = mine.find((l) => l.el.getAttribute('data-role') === 'join');
    const end = join ?? starts.find((l) => l.x1 > startX)!;
    return { letter, startX, endX: end.x1, endRole: end.el.getAttribute('data-role')!, ticks: mine.filter((l) => isTick(l.el)) };
  });
}

describe('rim strip', () => {
  it('one piece when it fits: length π·(D + t) between the two seams, BDC at both ends', () => {
    const D = 50;
    const t = 0.1;
    const { svg } = stripSvg({ diameterMm: D });
    const [only] = segments(svg);
    // π·(50 + 0.1) = 157.3938 mm (hand: 3.14159265 × 50.1).
    expect(only!.endX - only!.startX).toBeCloseTo(Math.PI * (D + t), 3);
    const seams = lines(svg, (el) => el.getAttribute('data-role') === 'seam');
    expect(seams.map((s) => s.el.getAttribute('data-crank-deg'))).toEqual(['180', '180']);
    const first = only!.ticks.reduce((a, b) => (a.x1 < b.x1 ? a : b));
    const last = only!.ticks.reduce((a, b) => (a.x1 > b.x1 ? a : b));
    expect(first.el.getAttribute('data-crank-deg')).toBe('180');
    expect(last.el.getAttribute('data-crank-deg')).toBe('180');
    expect(first.x1).toBeCloseTo(only!.startX, 3);
    expect(last.x1).toBeCloseTo(only!.endX, 3);
    // An unmarked glue tail beyond the end seam.
    const tail = svg.all('text').filter((el) => el.getAttribute('data-role') === 'glue-tail');
    expect(tail.map((el) => el.textContent).join(' ')).toBe('glue under start');
    expect(only!.ticks.every((tick) => tick.x1 <= only!.endX + 1e-3)).toBe(true);
  });

  it('places every tick at (seam − crank)·π(D+t)/360 along the arrow on a rotating strip, (crank − seam) on a stationary one', () => {
    for (const carrier of ['rotating', 'stationary'] as const) {
      const D = 45;
      const mmPerDeg = (Math.PI * (D + 0.1)) / 360;
      const { svg } = stripSvg({ diameterMm: D, carrier, seamCrankDeg: 200 });
      const [only] = segments(svg);
      expect(only!.ticks.length).toBeGreaterThan(70);
      for (const tick of only!.ticks) {
        const crank = n(tick.el, 'data-crank-deg');
        const alongDeg = (((carrier === 'rotating' ? 200 - crank : crank - 200) % 360) + 360) % 360;
        const x = tick.x1 - only!.startX;
        // The seam tick appears at both ends (0 and 360).
        const candidates = alongDeg === 0 ? [0, 360 * mmPerDeg] : [alongDeg * mmPerDeg];
        expect(Math.min(...candidates.map((c) => Math.abs(c - x)))).toBeLessThanOrEqual(0.001);
      }
    }
  });

  it('rotating strip: 18° BTDC lies ahead of TDC along the arrow; stationary: behind', () => {
    const along = (carrier: 'rotating' | 'stationary') => {
      const { svg } = stripSvg({ diameterMm: 50, carrier, advanceMarksDeg: [18] });
      const mark = lines(svg, (el) => el.getAttribute('data-advance-deg') === '18')[0]!;
      const tdc = lines(svg, (el) => isTick(el) && el.getAttribute('data-crank-deg') === '0')[0]!;
      return mark.x1 - tdc.x1;
    };
    const mmPer18 = (Math.PI * 50.1 * 18) / 360; // 7.8697 mm
    expect(along('rotating')).toBeCloseTo(mmPer18, 3);
    expect(along('stationary')).toBeCloseTo(-mmPer18, 3);
  });

  it.each([
    [120, 'A4', 0.001],
    [300, 'Letter', 0.002],
    [600, 'A4', 0.003],
  ] as const)('D = %s mm on %s: the lettered segments’ marked lengths add up to π·(D + t)', (D, paper, tolerance) => {
    const { svg, drawing } = stripSvg({ diameterMm: D, paper });
    const parts = segments(svg);
    expect(parts.length).toBeGreaterThan(1);
    expect(parts.map((p) => p.letter).join('')).toBe('ABCDEFGHIJKLMNOPQRSTUVWXYZ'.slice(0, parts.length));
    const total = parts.reduce((sum, p) => sum + (p.endX - p.startX), 0);
    expect(Math.abs(total - Math.PI * (D + 0.1))).toBeLessThanOrEqual(tolerance);
    expect(parts.slice(0, -1).every((p) => p.endRole === 'join')).toBe(true);
    expect(parts.at(-1)!.endRole).toBe('seam');
    expect(drawing.warnings.some((w) => w.includes(`${parts.length} segments`))).toBe(true);
    // Joined end to end the crank angles run on: each segment starts where the last one's marked part ended.
    const mmPerDeg = (Math.PI * (D + 0.1)) / 360;
    let offsetMm = 0;
    for (const part of parts) {
      for (const tick of part.ticks) {
        const alongMm = offsetMm + tick.x1 - part.startX;
        const crank = n(tick.el, 'data-crank-deg');
        const expectedAlongDeg = (((180 - crank) % 360) + 360) % 360;
        const gapDeg = Math.abs(((alongMm / mmPerDeg - expectedAlongDeg + 180) % 360 + 360) % 360 - 180);
        expect(gapDeg * mmPerDeg).toBeLessThanOrEqual(0.002);
      }
      offsetMm += part.endX - part.startX;
    }
  });

  it('repeats the overlap ticks: the ticks past A’s join line are B’s first ticks, same crank angles, same offsets', () => {
    const { svg } = stripSvg({ diameterMm: 150 });
    const parts = segments(svg);
    for (let i = 0; i + 1 < parts.length; i += 1) {
      const a = parts[i]!;
      const b = parts[i + 1]!;
      const inA = a.ticks.filter((t) => t.x1 >= a.endX - 1e-6).map((t) => [t.x1 - a.endX, n(t.el, 'data-crank-deg')] as const);
      const inB = b.ticks.filter((t) => t.x1 - b.startX <= STRIP_OVERLAP_MM + 1e-6).map((t) => [t.x1 - b.startX, n(t.el, 'data-crank-deg')] as const);
      expect(inA.length).toBeGreaterThan(5);
      expect(inA.length).toBe(inB.length);
      inA.forEach(([offset, crank], k) => {
        expect(crank).toBe(inB[k]![1]);
        expect(Math.abs(offset - inB[k]![0])).toBeLessThanOrEqual(0.001);
      });
      // Overlap is about 10 mm: the last tick of A lies no further than that past its join line.
      expect(Math.max(...inA.map(([o]) => o))).toBeLessThanOrEqual(STRIP_OVERLAP_MM + 1e-6);
    }
  });

  it('is the same for cw and ccw engines: the printed arrow carries the direction', () => {
    const ticks = (rotation: 'cw' | 'ccw') =>
      lines(stripSvg({ diameterMm: 50, rotation, advanceMarksDeg: [18] }).svg, (el) => isTick(el) || el.hasAttribute('data-advance-deg')).map((t) => [t.x1, t.el.getAttribute('data-crank-deg')]);
    expect(ticks('ccw')).toEqual(ticks('cw'));
  });

  it('keeps the ignition region unbroken with the seam at BDC by default, or moves it to seamCrankDeg', () => {
    expect(stripRange({ carrier: 'rotating', seamCrankDeg: 180 }).startAlongDeg).toBe(180);
    const { svg } = stripSvg({ diameterMm: 50, seamCrankDeg: 90 });
    const seams = lines(svg, (el) => el.getAttribute('data-role') === 'seam');
    expect(seams.map((s) => s.el.getAttribute('data-crank-deg'))).toEqual(['90', '90']);
  });

  it('a window strip [320, 10] (40° BTDC to 10° ATDC) carries only that range, both ends included', () => {
    expect(windowSpanDeg([320, 10])).toBe(50);
    const { svg } = stripSvg({ diameterMm: 150, windowCrankDeg: [320, 10] });
    const ticks = lines(svg, isTick);
    const cranks = ticks.map((t) => n(t.el, 'data-crank-deg'));
    // 0.5° pitch on π·150.1 mm: 0.655 mm ≥ 0.6, so every half degree from 320 through 0 to 10: 50/0.5 + 1 = 101.
    expect(ticks).toHaveLength(101);
    expect(cranks.every((c) => c >= 320 || c <= 10)).toBe(true);
    expect(cranks).toContain(320);
    expect(cranks).toContain(10);
    const [only] = segments(svg);
    expect(only!.endX - only!.startX).toBeCloseTo((Math.PI * 150.1 * 50) / 360, 3);
    expect(svg.all('text').some((t) => t.textContent === 'window 40° BTDC to 10° ATDC')).toBe(true);
    expect(svg.all('text').some((t) => t.getAttribute('data-role') === 'glue-tail')).toBe(false);
  });

  it('plans equal segments that fit the row with their overlap', () => {
    const plan = planStrip(req({ kind: 'strip', diameterMm: 200 }), 193);
    const lengths = plan.segments.map((s) => s.markedMm + s.extensionMm);
    expect(Math.max(...lengths)).toBeLessThanOrEqual(193);
    expect(plan.segments.reduce((sum, s) => sum + s.markedMm, 0)).toBeCloseTo(Math.PI * 200.1, 9);
  });

  it.each([120, 150, 300])('D = %s mm: the dashed join lines stop short of every numeral (no numeral box crossed)', (D) => {
    const { svg } = stripSvg({ diameterMm: D });
    const joins = lines(svg, (el) => el.getAttribute('data-role') === 'join');
    expect(joins.length).toBeGreaterThan(0);
    const numerals = svg.all('text').filter((t) => t.getAttribute('data-role') === 'numeral').map(textBox);
    for (const join of joins)
      for (const box of numerals) {
        const xs = box.corners.map(([x]) => x);
        const ys = box.corners.map(([, y]) => y);
        const crossesX = join.x1 > Math.min(...xs) && join.x1 < Math.max(...xs);
        const crossesY = Math.max(join.y1, join.y2) > Math.min(...ys) && Math.min(join.y1, join.y2) < Math.max(...ys);
        expect(crossesX && crossesY, `join at x ${join.x1} through "${box.text}"`).toBe(false);
      }
  });
});
