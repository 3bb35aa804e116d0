// Source under test: lib/sheet/graduations.ts (levels, minimum pitch rule) and its use in
// lib/sheet/wheel-layout.ts, measured through the SVG.
import { describe, expect, it } from 'vitest';
import { buildDrawing } from '@/lib/sheet/build-drawing';
import { arcLengthMm } from '@/lib/engine/arc-chord';
import { chooseLevels, graduationNumber, levelOfHalfDegIndex, ticksInAlongRange } from '@/lib/sheet/graduations';
import { renderSvg } from '@/lib/sheet/render-svg';
import { FIXED_DATE, isTick, lines, parseSvg, req } from './svg-measure';

function tickLevels(diameterMm: number, minPitchMm?: number) {
  const drawing = buildDrawing(req({ kind: 'wheel', diameterMm, ...(minPitchMm ? { minPitchMm } : {}) }), { date: FIXED_DATE });
  const svg = parseSvg(renderSvg(drawing));
  const levels = lines(svg, isTick).map((t) => t.el.getAttribute('data-level'));
  return { drawing, levels, count: (level: string) => levels.filter((l) => l === level).length };
}

describe('graduation levels', () => {
  it('gives each half-degree index the coarsest level that divides it', () => {
    expect([0, 20, 10, 2, 1, 19, 700].map(levelOfHalfDegIndex)).toEqual([10, 10, 5, 1, 0.5, 0.5, 10]);
  });

  it('computes ticks from integer indices, so 720 steps land exactly on i × 0.5°', () => {
    const ticks = ticksInAlongRange(0, 719, 0.5, 'stationary');
    expect(ticks).toHaveLength(720);
    ticks.forEach((tick, i) => expect(tick.crankDeg).toBe(i * 0.5));
  });

  it('drops 0.5° on a 100 mm wheel (0.44 mm < 0.6 mm) and says so', () => {
    const { drawing, count, levels } = tickLevels(100);
    expect(levels).toHaveLength(360);
    expect(count('0.5')).toBe(0);
    expect(count('1')).toBe(288);
    expect(drawing.warnings).toContain('0.5° graduations left out: 0.44 mm apart at this diameter, below the 0.6 mm minimum');
  });

  it('drops 1° and 0.5° on a 30 mm wheel (1°: π·30/360 = 0.26 mm) and keeps 5° (1.31 mm)', () => {
    const { drawing, count, levels } = tickLevels(30);
    expect(levels).toHaveLength(72);
    expect([count('10'), count('5')]).toEqual([36, 36]);
    expect(drawing.warnings).toEqual(
      expect.arrayContaining([
        '1° graduations left out: 0.26 mm apart at this diameter, below the 0.6 mm minimum',
        '0.5° graduations left out: 0.13 mm apart at this diameter, below the 0.6 mm minimum',
      ]),
    );
  });

  it('follows an edited minimum pitch (0.2 mm keeps 1° at 30 mm)', () => {
    expect(tickLevels(30, 0.2).levels).toHaveLength(360);
  });

  it('is exact at the boundary: pitch equal to the minimum is kept, a hair less is dropped', () => {
    // 0.5° pitch = 0.6 mm when d = 0.6·360/(π·0.5) = 137.50987 mm.
    const boundary = (0.6 * 360) / (Math.PI * 0.5);
    expect(chooseLevels(arcLengthMm(boundary, 1), 0.6).finestLevel).toBe(0.5);
    expect(chooseLevels(arcLengthMm(boundary - 0.001, 1), 0.6).finestLevel).toBe(1);
    expect(tickLevels(boundary).levels).toHaveLength(720);
    expect(tickLevels(boundary - 0.001).levels).toHaveLength(360);
    expect(tickLevels(boundary).drawing.warnings.filter((w) => w.includes('left out'))).toEqual([]);
  });

  it('always keeps the numbered 10° level, with a warning when even that is below the minimum', () => {
    const choice = chooseLevels(arcLengthMm(20, 1), 5);
    expect(choice.keptLevels).toEqual([10]);
    expect(choice.warnings[0]).toBe('10° graduations kept although only 1.75 mm apart at this diameter, below the 5 mm minimum');
  });

  it('numbers split scales symmetrically and full scales in crank order', () => {
    expect(['split', 'full'].map((numbering) => [0, 10, 180, 190, 350].map((c) => graduationNumber(c, numbering as 'split' | 'full')))).toEqual([
      ['0', '10', '180', '170', '10'],
      ['0', '10', '180', '190', '350'],
    ]);
  });
});
