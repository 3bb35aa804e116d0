// Source under test: label placement in lib/sheet/polar-scale.ts (side labels, mark labels) and
// lib/sheet/strip-layout.ts, checked on the SVG output read back with @xmldom/xmldom. Text boxes are
// estimated in ./text-boxes.ts (size × characters × 0.6 wide). BTDC = 360 − crank angle, ATDC =
// crank angle (DEVELOPERS.md, "Angles", the trade's convention).
import { describe, expect, it } from 'vitest';
import { buildDrawing } from '@/lib/sheet/build-drawing';
import { renderSvg } from '@/lib/sheet/render-svg';
import { boxesOverlap, overlappingTexts, textBox } from './text-boxes';
import { expectPagesPrintable } from './sheet-checks';
import { FIXED_DATE, n, parseSvg, req, type Svg } from './svg-measure';

const PORTS = [
  { name: 'Exhaust', opensCrankDeg: 92, closesCrankDeg: 268 },
  { name: 'Transfer', opensCrankDeg: 120, closesCrankDeg: 240 },
];

function svgOf(input: Parameters<typeof req>[0]): Svg {
  return parseSvg(renderSvg(buildDrawing(req(input), { date: FIXED_DATE })));
}

/** Texts inside the wheel's cut circle: the scale's own labels (not the info panel). */
function insideWheel(svg: Svg) {
  const cut = svg.all('circle').find((c) => c.getAttribute('data-role') === 'cut-line')!;
  const [cx, cy, r] = [n(cut, 'cx'), n(cut, 'cy'), n(cut, 'r')];
  return (el: Parameters<typeof textBox>[0]) => Math.hypot(n(el, 'x') - cx, n(el, 'y') - cy) < r;
}

describe('the overlap check itself', () => {
  it('sees two words written over each other, and not two side by side', () => {
    const svg = parseSvg(
      '<svg xmlns="http://www.w3.org/2000/svg"><text x="10" y="10" font-size="2">ATDC side</text><text x="12" y="10.5" font-size="2">Exhaust</text><text x="40" y="10" font-size="2">far</text><text x="10" y="10" font-size="2" transform="rotate(90 10 10)">down</text></svg>',
    );
    const [a, b, far, down] = svg.all('text').map(textBox);
    expect(boxesOverlap(a!, b!)).toBe(true);
    expect(boxesOverlap(a!, far!)).toBe(false);
    // "down" turns clockwise about (10, 10): it runs down the page from there, left edge at x = 8.4.
    expect(boxesOverlap(a!, down!)).toBe(true);
    expect(boxesOverlap(far!, down!)).toBe(false);
  });
});

describe('side labels keep clear of mark labels', () => {
  it.each([
    ['cw', 'rotating'],
    ['ccw', 'rotating'],
    ['cw', 'stationary'],
    ['ccw', 'stationary'],
  ] as const)('a 150 mm full wheel with ports at 92/268 and 120/240 (%s, %s): no two texts overlap', (rotation, carrier) => {
    const svg = svgOf({ kind: 'wheel', diameterMm: 150, numbering: 'full', portEvents: PORTS, rotation, carrier });
    const texts = svg.all('text').filter(insideWheel(svg));
    expect(texts.filter((t) => t.getAttribute('data-role') === 'port-label')).toHaveLength(4);
    expect(overlappingTexts(svg, insideWheel(svg))).toEqual([]);
    // Each side label stays on its own half: ATDC crank 0–180, BTDC 180–360.
    const crankOf = (role: string) => n(texts.find((t) => t.getAttribute('data-role') === role)!, 'data-crank-deg');
    expect(crankOf('atdc-side')).toBeGreaterThan(0);
    expect(crankOf('atdc-side')).toBeLessThan(180);
    expect(crankOf('btdc-side')).toBeGreaterThan(180);
    expect(crankOf('btdc-side')).toBeLessThan(360);
  });

  it('stays at 90° / 270° when nothing is near there', () => {
    const svg = svgOf({ kind: 'wheel', diameterMm: 150, advanceMarksDeg: [18] });
    const crank = (role: string) => n(svg.all('text').find((t) => t.getAttribute('data-role') === role)!, 'data-crank-deg');
    expect(crank('atdc-side')).toBe(90);
    expect(crank('btdc-side')).toBe(270);
  });

  it.each([120, 180, 240])('a %s mm full wheel with the same ports: no two texts overlap', (diameterMm) => {
    const svg = svgOf({ kind: 'wheel', diameterMm, numbering: 'full', portEvents: PORTS, advanceMarksDeg: [18] });
    expect(overlappingTexts(svg, insideWheel(svg))).toEqual([]);
  });
});

describe('advance marks 1° apart keep legible labels', () => {
  const ADVANCE = [16, 17, 18, 19, 20];

  it.each([
    ['cw', 'rotating', 150],
    ['ccw', 'rotating', 150],
    ['cw', 'stationary', 150],
    ['cw', 'rotating', 100],
    ['cw', 'rotating', 240],
  ] as const)('a %s %s %s mm wheel with 16–20° BTDC: five labels, no two texts overlap', (rotation, carrier, diameterMm) => {
    const svg = svgOf({ kind: 'wheel', diameterMm, advanceMarksDeg: ADVANCE, rotation, carrier });
    const labels = svg.all('text').filter((t) => t.getAttribute('data-role') === 'advance-label');
    expect(labels.map((t) => t.textContent).sort()).toEqual(ADVANCE.map((d) => `${d}° BTDC`));
    expect(overlappingTexts(svg, insideWheel(svg))).toEqual([]);
  });

  it('a full wheel with 16–20° BTDC and the ports at 92/268 and 120/240: no two texts overlap', () => {
    const svg = svgOf({ kind: 'wheel', diameterMm: 150, numbering: 'full', advanceMarksDeg: ADVANCE, portEvents: PORTS });
    expect(svg.all('text').filter((t) => ['advance-label', 'port-label'].includes(t.getAttribute('data-role') ?? ''))).toHaveLength(9);
    expect(overlappingTexts(svg, insideWheel(svg))).toEqual([]);
  });

  it.each([
    ['a 120 mm strip (3 segments)', { kind: 'strip', diameterMm: 120 }],
    ['a 60 mm strip (1 segment)', { kind: 'strip', diameterMm: 60, paper: 'A4', orientation: 'landscape' }],
    ['a 120 mm full strip with ports', { kind: 'strip', diameterMm: 120, numbering: 'full', portEvents: PORTS }],
  ] as const)('%s with 16–20° BTDC: every label drawn, joined to its own mark, no two texts overlap', (_, input) => {
    const svg = svgOf({ ...input, advanceMarksDeg: ADVANCE });
    // The strip rows, stacked below the info panel: from 6 mm above the first row's cut line down
    // (its segment letter and captions sit in the 5 mm band above it).
    const rowsTop = Math.min(...svg.all('rect').filter((r) => r.getAttribute('data-role') === 'cut-line').map((r) => n(r, 'y'))) - 6;
    const inRows = (el: Parameters<typeof textBox>[0]) => n(el, 'y') > rowsTop;
    expect(svg.all('text').filter(inRows).length).toBeGreaterThan(20);
    const labels = svg.all('text').filter((t) => t.getAttribute('data-role') === 'advance-label');
    expect(new Set(labels.map((t) => t.textContent))).toEqual(new Set(ADVANCE.map((d) => `${d}° BTDC`)));
    expect(overlappingTexts(svg, inRows)).toEqual([]);
    // Each label is joined to its own mark: a leader starts on the mark's lower end, or the label
    // stands right under that end, its box centred on the mark's x.
    const marks = svg.all('line').filter((l) => l.getAttribute('data-role') === 'advance');
    const leaders = svg.all('line').filter((l) => l.getAttribute('data-role') === 'label-leader');
    const centreX = (el: Parameters<typeof textBox>[0]) => {
      const xs = textBox(el).corners.map(([x]) => x);
      return (Math.min(...xs) + Math.max(...xs)) / 2;
    };
    for (const mark of marks) {
      const led = leaders.some((l) => Math.abs(n(l, 'x1') - n(mark, 'x1')) < 1e-3 && Math.abs(n(l, 'y1') - n(mark, 'y2')) < 1e-3);
      const under = labels.some((t) => t.getAttribute('data-segment') === mark.getAttribute('data-segment') && Math.abs(centreX(t) - n(mark, 'x1')) < 0.3 && n(t, 'y') > n(mark, 'y2'));
      expect(led || under).toBe(true);
    }
  });
});

describe('more marks than labels can hold', () => {
  const EVERY_DEGREE = Array.from({ length: 61 }, (_, i) => i); // 0–60° BTDC, the schema's whole range

  it.each([
    ['a 100 mm wheel', { kind: 'wheel', diameterMm: 100 }],
    ['a 100 mm strip', { kind: 'strip', diameterMm: 100 }],
  ] as const)('%s with a mark every degree: labels left off with a warning, the rest clear of each other, pages printable', (_, input) => {
    const drawing = buildDrawing(req({ ...input, advanceMarksDeg: EVERY_DEGREE }), { date: FIXED_DATE });
    expectPagesPrintable(drawing);
    expect(drawing.warnings.some((w) => /advance\/port marks are drawn without a label/.test(w))).toBe(true);
    const svg = parseSvg(renderSvg(drawing));
    const labels = svg.all('text').filter((t) => t.getAttribute('data-role') === 'advance-label');
    expect(labels.length).toBeGreaterThan(5);
    expect(labels.length).toBeLessThan(61);
    const isLabel = (el: Parameters<typeof textBox>[0]) => el.getAttribute('data-role') === 'advance-label';
    expect(overlappingTexts(svg, isLabel)).toEqual([]);
  });
});
