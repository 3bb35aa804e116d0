// Source under test: lib/sheet/build-drawing.ts and lib/sheet/render-svg.ts over random valid
// requests (fast-check), the SVG read back with @xmldom/xmldom. A strobe-readable sheet keeps its
// graduations finer than 5° only between its first and last strobe figure (lib/sheet/strobe.ts).
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { shapeBox } from '@/lib/sheet/bounds';
import { buildDrawing } from '@/lib/sheet/build-drawing';
import { renderSvg } from '@/lib/sheet/render-svg';
import { PAPER_NAMES } from '@/lib/sheet/paper';
import { sheetRequestSchema, type SheetRequest } from '@/lib/sheet/sheet-request';
import { expectPagesPrintable } from './sheet-checks';
import { FIXED_DATE, parseSvg } from './svg-measure';

const LEVELS = [10, 5, 1, 0.5] as const;

/** The levels kept (DEVELOPERS.md, "Graduation levels"): pitch π·d·step/360 at least the minimum; 10° always. */
function expectedFinest(diameterMm: number, minPitchMm: number): number {
  return LEVELS.filter((step) => step === 10 || (Math.PI * diameterMm * step) / 360 >= minPitchMm - 1e-9).at(-1)!;
}

function keptCranksAt(finest: number): Set<number> {
  const levelOf = (i: number) => (i % 20 === 0 ? 10 : i % 10 === 0 ? 5 : i % 2 === 0 ? 1 : 0.5);
  const kept = new Set<number>();
  for (let i = 0; i < 720; i += 1) if (levelOf(i) >= finest) kept.add(i / 2);
  return kept;
}

const diameter = fc.double({ min: 20, max: 600, noNaN: true });
const crank = fc.double({ min: 0, max: 360, noNaN: true });
const btdc = fc.double({ min: 0, max: 60, noNaN: true });

const request = fc
  .record({
    kind: fc.constantFrom('wheel', 'ring', 'strip', 'scribe', 'check'),
    diameterMm: diameter,
    hubShare: fc.double({ min: 0, max: 0.99, noNaN: true }),
    innerDiameterMm: fc.double({ min: 20, max: 590, noNaN: true }),
    ringWidthMm: fc.double({ min: 0.5, max: 200, noNaN: true }),
    paperThicknessMm: fc.double({ min: 0, max: 0.5, noNaN: true }),
    stripWidthMm: fc.double({ min: 6, max: 40, noNaN: true }),
    seamCrankDeg: crank,
    windowCrankDeg: fc.option(fc.tuple(crank, crank), { nil: undefined }),
    fromDeg: fc.double({ min: 0, max: 180, noNaN: true }),
    spanDeg: fc.double({ min: 0, max: 180, noNaN: true }),
    stepDeg: fc.double({ min: 0.1, max: 10, noNaN: true }),
    rotation: fc.constantFrom('cw', 'ccw'),
    carrier: fc.constantFrom('rotating', 'stationary'),
    numbering: fc.constantFrom('split', 'full'),
    advanceMarksDeg: fc.array(btdc, { maxLength: 8 }),
    advanceBandDeg: fc.option(fc.tuple(btdc, btdc), { nil: undefined }),
    targetAdvanceDeg: fc.option(btdc, { nil: undefined }),
    strobeReadable: fc.boolean(),
    portEvents: fc.array(fc.record({ name: fc.string({ minLength: 1, maxLength: 24 }).filter((s) => s.trim().length > 0), opensCrankDeg: crank, closesCrankDeg: crank }), { maxLength: 3 }),
    minPitchMm: fc.double({ min: 0.2, max: 5, noNaN: true }),
    paper: fc.constantFrom(...PAPER_NAMES),
    orientation: fc.constantFrom('portrait', 'landscape'),
    printerScaleX: fc.double({ min: 0.9, max: 1.1, noNaN: true }),
    printerScaleY: fc.double({ min: 0.9, max: 1.1, noNaN: true }),
    title: fc.string({ maxLength: 80 }),
  })
  .map(({ hubShare, ringWidthMm, spanDeg, ...r }) => {
    const toDeg = Math.min(180, r.fromDeg + spanDeg);
    return {
      ...r,
      hubHoleMm: r.diameterMm * hubShare,
      outerDiameterMm: Math.min(600, r.innerDiameterMm + ringWidthMm),
      toDeg,
      stepDeg: Math.max(r.stepDeg, (toDeg - r.fromDeg) / 399),
    };
  })
  .map((input) => sheetRequestSchema.safeParse(input))
  .filter((parsed) => parsed.success)
  .map((parsed) => parsed.data as SheetRequest);

describe('any valid request', () => {
  it('gives a finite, printable drawing whose SVG has the expected ticks', () => {
    fc.assert(
      fc.property(request, (req) => {
        const drawing = buildDrawing(req, { date: FIXED_DATE });
        const svg = parseSvg(renderSvg(drawing));
        // No NaN or Infinity in any attribute.
        for (const el of svg.all('*'))
          for (const attr of Array.from(el.attributes)) expect(attr.value, `${el.nodeName} ${attr.name}`).not.toMatch(/NaN|Infinity/);
        // Every mark inside the drawing.
        const { widthMm: W, heightMm: H } = drawing.sizeMm;
        for (const shape of drawing.shapes) {
          const box = shapeBox(shape);
          expect(box.minX).toBeGreaterThanOrEqual(-1e-6);
          expect(box.minY).toBeGreaterThanOrEqual(-1e-6);
          expect(box.maxX).toBeLessThanOrEqual(W + 1e-6);
          expect(box.maxY).toBeLessThanOrEqual(H + 1e-6);
        }
        expectPagesPrintable(drawing);
        // Ticks as expected from the levels kept.
        const cranks = svg.all('line').filter((el) => el.hasAttribute('data-level')).map((el) => Number(el.getAttribute('data-crank-deg')));
        // Strobe figures (when drawn) span a stretch of BTDC angles; fine ticks stay only there.
        const figuresBtdc = svg.all('text').filter((el) => el.getAttribute('data-role') === 'strobe-numeral').map((el) => (360 - Number(el.getAttribute('data-crank-deg'))) % 360);
        const keptCranks = (finest: number) => {
          const kept = keptCranksAt(finest);
          if (!figuresBtdc.length) return kept;
          const [lo, hi] = [Math.min(...figuresBtdc), Math.max(...figuresBtdc)];
          const fineKept = (c: number) => c % 5 === 0 || ((360 - c) % 360 >= lo - 1e-9 && (360 - c) % 360 <= hi + 1e-9);
          return new Set([...kept].filter(fineKept));
        };
        if (req.kind === 'wheel' || req.kind === 'ring') {
          const expected = keptCranks(expectedFinest(req.kind === 'wheel' ? req.diameterMm! : req.innerDiameterMm!, req.minPitchMm));
          expect(cranks).toHaveLength(expected.size);
          expect(new Set(cranks)).toEqual(expected);
        } else if (req.kind === 'strip') {
          const all = keptCranks(expectedFinest(req.diameterMm! + req.paperThicknessMm, req.minPitchMm));
          const w = req.windowCrankDeg;
          // Crank order from → to through 0; ends less than a micro-degree apart mean a whole turn.
          const rawSpan = w ? (((w[1] - w[0]) % 360) + 360) % 360 : 360;
          const span = rawSpan < 1e-6 || rawSpan > 360 - 1e-6 ? 360 : rawSpan;
          const inWindow = (c: number) => !w || (((c - w[0]) % 360) + 360) % 360 <= span + 1e-7;
          const expected = new Set([...all].filter(inWindow));
          expect(new Set(cranks)).toEqual(expected);
        } else expect(cranks).toHaveLength(0);
      }),
      { numRuns: 120, seed: 20261201 },
    );
    // 120 whole sheets: well over the default 30 s on a shared, loaded machine.
  }, 240_000);
});
