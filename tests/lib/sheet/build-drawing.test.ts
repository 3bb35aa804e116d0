// Source under test: lib/sheet/build-drawing.ts (entry point: re-validation, determinism, warnings).
import { describe, expect, it } from 'vitest';
import { buildDrawing } from '@/lib/sheet/build-drawing';
import { renderSvg } from '@/lib/sheet/render-svg';
import type { SheetRequest } from '@/lib/sheet/sheet-request';
import { FIXED_DATE, req } from './svg-measure';

describe('buildDrawing', () => {
  it('refuses a request that skipped validation with the schema’s message naming the field and range', () => {
    expect(() => buildDrawing({ kind: 'wheel' } as SheetRequest)).toThrow(/Diameter.*20–600 mm/);
    expect(() => buildDrawing({ ...req({ kind: 'wheel', diameterMm: 100 }), diameterMm: Number.NaN })).toThrow(/Diameter must be a number/);
  });

  it('is pure: the same request and date give the same SVG, byte for byte', () => {
    const request = req({ kind: 'strip', diameterMm: 133, advanceMarksDeg: [17, 19], advanceBandDeg: [16, 20] });
    expect(renderSvg(buildDrawing(request, { date: FIXED_DATE }))).toBe(renderSvg(buildDrawing(request, { date: FIXED_DATE })));
  });

  it('warns when marks are too close to all carry a label, and still draws every mark', () => {
    const marks = Array.from({ length: 61 }, (_, i) => i); // 0…60° BTDC, 1° apart
    const drawing = buildDrawing(req({ kind: 'wheel', diameterMm: 60, advanceMarksDeg: marks }), { date: FIXED_DATE });
    expect(drawing.shapes.filter((s) => s.data?.role === 'advance')).toHaveLength(61);
    expect(drawing.warnings.some((w) => /advance\/port marks are drawn without a label/.test(w))).toBe(true);
  });

  it('uses the title, or names the sheet when there is none', () => {
    expect(buildDrawing(req({ kind: 'wheel', diameterMm: 150, title: '  Kart rear  ' })).title).toBe('Kart rear');
    expect(buildDrawing(req({ kind: 'ring', innerDiameterMm: 110, outerDiameterMm: 140 })).title).toBe('Flange ring 110 mm / 140 mm');
  });
});
