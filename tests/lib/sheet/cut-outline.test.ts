// Source under test: lib/sheet/wheel-layout.ts, lib/sheet/polar-scale.ts and lib/sheet/strip-layout.ts
// through buildDrawing and renderSvg: everything that carries meaning lies inside its piece's cut
// outline, so cutting the piece out keeps it. Random requests (fast-check) over kind × rotation ×
// carrier × numbering × diameters 20–600 mm × strip widths 6–40 mm × strobe-readable or not (its
// figures and their white ground, lib/sheet/strobe.ts, count too); the SVG is read back with
// @xmldom/xmldom (an independent XML parser) and each text's box comes from its own font-size,
// text-anchor and rotate() attributes (tests/lib/sheet/text-boxes.ts, SVG 1.1 §7.5 for rotate).
import type { Element as XmlElement } from '@xmldom/xmldom';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { buildDrawing } from '@/lib/sheet/build-drawing';
import { renderSvg } from '@/lib/sheet/render-svg';
import { sheetRequestSchema, type SheetRequest } from '@/lib/sheet/sheet-request';
import { FIXED_DATE, n, parseSvg, type Svg } from './svg-measure';
import { textBox } from './text-boxes';

/** The texts that must survive the scissors (the furniture around a piece may lie outside). */
const ON_THE_PIECE = new Set(['numeral', 'strobe-numeral', 'advance-label', 'port-label', 'btdc-side', 'atdc-side', 'bdc-label', 'tdc-label', 'rotation-label', 'band-label', 'target-label']);
const SLACK_MM = 1e-3;

const crank = fc.double({ min: 0, max: 360, noNaN: true });
const btdc = fc.double({ min: 0, max: 60, noNaN: true });
const common = {
  rotation: fc.constantFrom('cw', 'ccw'),
  carrier: fc.constantFrom('rotating', 'stationary'),
  numbering: fc.constantFrom('split', 'full'),
  advanceMarksDeg: fc.array(fc.oneof(btdc, fc.integer({ min: 10, max: 30 })), { maxLength: 6 }),
  advanceBandDeg: fc.option(fc.tuple(btdc, btdc), { nil: undefined }),
  targetAdvanceDeg: fc.option(btdc, { nil: undefined }),
  strobeReadable: fc.boolean(),
  portEvents: fc.array(fc.record({ name: fc.constantFrom('EX', 'TR', 'IN', 'boost'), opensCrankDeg: crank, closesCrankDeg: crank }), { maxLength: 3 }),
  paper: fc.constantFrom('A4', 'A3', 'Letter'),
  orientation: fc.constantFrom('portrait', 'landscape'),
};

function parsed(input: object): SheetRequest | undefined {
  const result = sheetRequestSchema.safeParse(input);
  return result.success ? result.data : undefined;
}

const wheel = fc.record({ ...common, kind: fc.constant('wheel'), diameterMm: fc.double({ min: 20, max: 600, noNaN: true }), hubShare: fc.double({ min: 0, max: 0.6, noNaN: true }) }).map(({ hubShare, ...r }) => parsed({ ...r, hubHoleMm: r.diameterMm * hubShare }));
const ring = fc
  .record({ ...common, kind: fc.constant('ring'), innerDiameterMm: fc.double({ min: 20, max: 560, noNaN: true }), ringWidthMm: fc.double({ min: 4, max: 40, noNaN: true }) })
  .map(({ ringWidthMm, ...r }) => parsed({ ...r, outerDiameterMm: Math.min(600, r.innerDiameterMm + 2 * ringWidthMm) }));
const strip = fc
  .record({ ...common, kind: fc.constant('strip'), diameterMm: fc.double({ min: 20, max: 600, noNaN: true }), stripWidthMm: fc.double({ min: 6, max: 40, noNaN: true }), windowCrankDeg: fc.option(fc.tuple(crank, crank), { nil: undefined }) })
  .map((r) => parsed(r));

function circleOf(svg: Svg, role: string): { cx: number; cy: number; r: number } | undefined {
  const el = svg.all('circle').find((c) => c.getAttribute('data-role') === role);
  return el ? { cx: n(el, 'cx'), cy: n(el, 'cy'), r: n(el, 'r') } : undefined;
}

const onPiece = (el: XmlElement) => ON_THE_PIECE.has(el.getAttribute('data-role') ?? '');

/** Wheel disc or ring annulus: every corner of every box within the outer cut circle and outside the inner one (hub hole or ring inner edge). */
function expectInsidePolar(svg: Svg, innerRole: 'hub-hole' | 'cut-line-inner'): void {
  const outer = circleOf(svg, 'cut-line')!;
  const inner = circleOf(svg, innerRole);
  const texts = svg.all('text').filter(onPiece);
  expect(texts.length).toBeGreaterThan(0);
  for (const el of texts) {
    const box = textBox(el);
    const radii = box.corners.map(([x, y]) => Math.hypot(x - outer.cx, y - outer.cy));
    expect(Math.max(...radii), `"${box.text}" (${box.role}) beyond the cut circle r = ${outer.r}`).toBeLessThanOrEqual(outer.r + SLACK_MM);
    // A box whose corners all clear the inner circle can still cut it with an edge: check the edge nearest the centre too.
    if (inner) {
      const nearest = Math.min(...box.corners.map((p, i) => distanceToSegment([outer.cx, outer.cy], p, box.corners[(i + 1) % 4]!)));
      expect(nearest, `"${box.text}" (${box.role}) inside the inner circle r = ${inner.r}`).toBeGreaterThanOrEqual(inner.r - SLACK_MM);
    }
  }
  for (const el of svg.all('path').filter((p) => ['rotation-arrow', 'strobe-band'].includes(p.getAttribute('data-role') ?? ''))) {
    const role = el.getAttribute('data-role');
    const points = [...(el.getAttribute('d') ?? '').matchAll(/[ML](-?[\d.]+) (-?[\d.]+)/g)].map((m) => [Number(m[1]), Number(m[2])] as const);
    for (const [x, y] of points) {
      const r = Math.hypot(x - outer.cx, y - outer.cy);
      expect(r, `${role} within the cut circle`).toBeLessThanOrEqual(outer.r + SLACK_MM);
      if (inner) expect(r, `${role} outside the inner circle`).toBeGreaterThanOrEqual(inner.r - SLACK_MM);
    }
  }
}

function distanceToSegment([px, py]: [number, number], [ax, ay]: [number, number], [bx, by]: [number, number]): number {
  const [dx, dy] = [bx - ax, by - ay];
  const t = Math.max(0, Math.min(1, ((px - ax) * dx + (py - ay) * dy) / (dx * dx + dy * dy || 1)));
  return Math.hypot(ax + t * dx - px, ay + t * dy - py);
}

/** Strip pieces: each text inside the cut rectangle of its own segment (data-segment), or of the only one. */
function expectInsideStrips(svg: Svg): void {
  const cuts = new Map(svg.all('rect').filter((r) => r.getAttribute('data-role') === 'cut-line').map((r) => [r.getAttribute('data-segment') ?? '', { x: n(r, 'x'), y: n(r, 'y'), w: n(r, 'width'), h: n(r, 'height') }]));
  const texts = svg.all('text').filter(onPiece);
  // A window of a hair's breadth holds no text (its notes say so); any strip a numeral long holds some.
  if ([...cuts.values()].some((cut) => cut.w >= 5)) expect(texts.length).toBeGreaterThan(0);
  for (const el of texts) {
    const box = textBox(el);
    const cut = cuts.get(el.getAttribute('data-segment') ?? '');
    expect(cut, `a cut line for "${box.text}"`).toBeDefined();
    for (const [x, y] of box.corners) {
      expect(x, `"${box.text}" (${box.role}) left of its strip`).toBeGreaterThanOrEqual(cut!.x - SLACK_MM);
      expect(x, `"${box.text}" (${box.role}) right of its strip`).toBeLessThanOrEqual(cut!.x + cut!.w + SLACK_MM);
      expect(y, `"${box.text}" (${box.role}) above its strip`).toBeGreaterThanOrEqual(cut!.y - SLACK_MM);
      expect(y, `"${box.text}" (${box.role}) below its strip`).toBeLessThanOrEqual(cut!.y + cut!.h + SLACK_MM);
    }
  }
  // The strobe figures' white ground: inside its own segment too.
  for (const el of svg.all('rect').filter((r) => r.getAttribute('data-role') === 'strobe-band')) {
    const cut = cuts.get(el.getAttribute('data-segment') ?? '')!;
    expect(n(el, 'x'), 'strobe band left of its strip').toBeGreaterThanOrEqual(cut.x - SLACK_MM);
    expect(n(el, 'x') + n(el, 'width'), 'strobe band right of its strip').toBeLessThanOrEqual(cut.x + cut.w + SLACK_MM);
    expect(n(el, 'y'), 'strobe band above its strip').toBeGreaterThanOrEqual(cut.y - SLACK_MM);
    expect(n(el, 'y') + n(el, 'height'), 'strobe band below its strip').toBeLessThanOrEqual(cut.y + cut.h + SLACK_MM);
  }
}

const svgOf = (req: SheetRequest) => parseSvg(renderSvg(buildDrawing(req, { date: FIXED_DATE })));
const RUNS = { numRuns: 40, seed: 20261203 };

describe('every label lies inside its piece’s cut outline', () => {
  it('degree wheels 20–600 mm, with and without hub holes', () => {
    fc.assert(fc.property(wheel, (req) => void (req && expectInsidePolar(svgOf(req), 'hub-hole'))), RUNS);
  }, 180_000);

  it('flange rings from 4 mm to 40 mm wide, 20–600 mm', () => {
    fc.assert(fc.property(ring, (req) => void (req && expectInsidePolar(svgOf(req), 'cut-line-inner'))), RUNS);
  }, 180_000);

  it('rim strips and window strips 6–40 mm wide, 20–600 mm rims', () => {
    fc.assert(fc.property(strip, (req) => void (req && expectInsideStrips(svgOf(req)))), RUNS);
  }, 180_000);

  it.each([
    ['a 130/160 mm flange ring', { kind: 'ring', innerDiameterMm: 130, outerDiameterMm: 160, advanceMarksDeg: [18], advanceBandDeg: [16, 20] }],
    ['a 90 mm rim strip 12 mm wide with ports', { kind: 'strip', diameterMm: 90, advanceMarksDeg: [18], numbering: 'full', portEvents: [{ name: 'EX', opensCrankDeg: 98, closesCrankDeg: 262 }] }],
    ['a 6 mm window strip', { kind: 'strip', diameterMm: 120, stripWidthMm: 6, windowCrankDeg: [300, 60], advanceMarksDeg: [18] }],
  ] as const)('%s (the cases that used to hang labels outside)', (_, input) => {
    const req = parsed(input)!;
    const svg = svgOf(req);
    if (req.kind === 'ring') expectInsidePolar(svg, 'cut-line-inner');
    else expectInsideStrips(svg);
    expect(svg.all('text').filter((t) => t.getAttribute('data-role') === 'advance-label').map((t) => t.textContent)).toContain('18° BTDC');
  });
});
