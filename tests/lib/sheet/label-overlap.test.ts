// Source under test: label placement in lib/sheet/polar-scale.ts (side labels, mark labels) and
// lib/sheet/strip-layout.ts, checked on the SVG output read back with @xmldom/xmldom. Text boxes are
// estimated in ./text-boxes.ts (size × characters × 0.6 wide). BTDC = 360 − crank angle, ATDC =
// crank angle (PRODUCT.md §2, the trade's convention).
import { describe, expect, it } from 'vitest';
import { buildDrawing } from '@/lib/sheet/build-drawing';
import { renderSvg } from '@/lib/sheet/render-svg';
import { boxesOverlap, overlappingTexts, textBox } from './text-boxes';
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
